import { In, type DataSource, type EntityManager } from 'typeorm';
import type { PlantingList, PlantingResult, RecordPlantingsBody } from '../../shared/schemas/outcomes.schema.js';
import { Site } from '../db/entities/site.entity.js';
import { TreeCheck } from '../db/entities/tree-check.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { plantingDecision, refusals } from '../domain/outcomes/planting-rules.js';
import { localDate } from '../domain/tide/time-zone.js';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../errors.js';
import { lockWorkday } from './crew-places.js';
import { lockTrees, requireAllFound } from './tree-history.js';
import { previousPlace } from './planting-undo.js';

/**
 * Planting records: which trees a planting workday put in the ground, where, when and at what
 * bed elevation. Every change takes the workday's row lock, then the trees' (in id order).
 */
export function createPlantingService(deps: { db: DataSource; clock: () => Date }) {
  async function siteOf(tx: EntityManager, w: Workday): Promise<Site> {
    return tx.getRepository(Site).findOneByOrFail({ id: w.siteId });
  }

  async function listFor(tx: EntityManager, w: Workday, site: Site): Promise<PlantingList> {
    const trees = await tx.getRepository(Tree).find({ where: [{ reservedWorkdayId: w.id }, { plantedWorkdayId: w.id }], order: { tag: 'ASC' } });
    // Trees monitoring has checked cannot be undone (see `undo`), so the screen hides their Undo.
    const plantedIds = trees.filter((t) => t.plantedWorkdayId === w.id).map((t) => t.id);
    const checks = plantedIds.length ? await tx.getRepository(TreeCheck).find({ select: { treeId: true }, where: { treeId: In(plantedIds) } }) : [];
    const checked = new Set(checks.map((c) => c.treeId));
    return {
      workday: { id: w.id, title: w.title, status: w.status, kind: w.kind, localDate: localDate(w.startsAt.getTime(), site.timeZone) },
      site: { id: site.id, name: site.name, bedElevationM: site.bedElevationM, stationId: site.stationId },
      trees: trees.map((t) => ({
        id: t.id, tag: t.tag, stage: t.stage, heightCm: t.heightCm,
        reserved: t.reservedWorkdayId === w.id, planted: t.plantedWorkdayId === w.id,
        plantedOn: t.plantedOn, plantedBedElevationM: t.plantedBedElevationM, suggestedBedElevationM: site.bedElevationM, hasChecks: checked.has(t.id),
      })),
    };
  }

  function plantedOnFor(w: Workday, site: Site, asked: string | undefined): string {
    const day = localDate(w.startsAt.getTime(), site.timeZone);
    const plantedOn = asked ?? day;
    if (plantedOn > localDate(deps.clock().getTime(), site.timeZone)) throw new ValidationError('A planting cannot be recorded ahead of time', { plantedOn: ['cannot be in the future'] });
    if (plantedOn < day) throw new ValidationError('A workday cannot plant before its own date', { plantedOn: [`cannot be before the workday (${day})`] });
    return plantedOn;
  }

  return {
    async list(workdayId: string): Promise<PlantingList> {
      return deps.db.transaction(async (tx) => {
        const w = await tx.getRepository(Workday).findOneBy({ id: workdayId });
        if (!w) throw new NotFoundError('Workday');
        return listFor(tx, w, await siteOf(tx, w));
      });
    },

    /** Records every listed tree as planted, or none (see planting-rules.ts for who may be). */
    async record(workdayId: string, body: RecordPlantingsBody, userId: string): Promise<PlantingResult> {
      return deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, workdayId);
        if (w.kind !== 'planting') throw new ConflictError(`Only planting workdays record plantings; this one is a ${w.kind} workday`);
        if (w.status === 'draft' || w.status === 'cancelled') throw new ConflictError(`The workday is ${w.status}; plantings are recorded for published or completed workdays`);
        const site = await siteOf(tx, w);
        const plantedOn = plantedOnFor(w, site, body.plantedOn);
        const ids = body.trees.map((t) => t.treeId);
        const trees = await lockTrees(tx, ids);
        requireAllFound(ids, trees, 'trees');
        const decisions = new Map(trees.map((t) => [t.id, plantingDecision(t, w.id, body.allowUnready)]));
        const refused = refusals([...decisions.values()]);
        if (refused) {
          const message = `${refused.problems.length} of the trees cannot be recorded as planted; nothing was changed`;
          throw new AppError(refused.status, refused.status === 409 ? 'conflict' : 'validation_failed', message, { trees: refused.problems });
        }
        const elevation = new Map(body.trees.map((t) => [t.treeId, t.bedElevationM ?? site.bedElevationM]));
        const at = deps.clock();
        const toPlant = trees.filter((t) => decisions.get(t.id)?.kind === 'plant');
        // One UPDATE per bed elevation (usually just the site's), not one per tree: a day may plant hundreds.
        const byElevation = new Map<number, string[]>();
        for (const t of toPlant) {
          const bed = elevation.get(t.id)!;
          const ids = byElevation.get(bed);
          if (ids) ids.push(t.id);
          else byElevation.set(bed, [t.id]);
        }
        for (const [bed, ids] of byElevation) {
          await tx.getRepository(Tree).update({ id: In(ids) }, { stage: 'planted', siteId: site.id, plantedOn, plantedBedElevationM: bed, plantedWorkdayId: w.id, tankId: null });
        }
        const note = `Planted at ${site.name} on ${plantedOn} ("${w.title}")`;
        // The stage event keeps the tank the tree left, so an undo can put it back.
        const events: Partial<TreeEvent>[] = toPlant.flatMap((t) => [
          { treeId: t.id, kind: 'stage' as const, at, byId: userId, fromStage: t.stage, toStage: 'planted' as const, tankId: t.tankId, note },
          ...(t.tankId ? [{ treeId: t.id, kind: 'move' as const, at, byId: userId, tankId: null, note: 'Left the nursery for planting' }] : []),
        ]);
        for (let i = 0; i < events.length; i += 1000) await tx.getRepository(TreeEvent).insert(events.slice(i, i + 1000));
        return { ...(await listFor(tx, w, site)), recorded: toPlant.length, unchanged: trees.length - toPlant.length };
      });
    },

    /** Undoes a mistaken record: the tree goes back to its stage (and tank) before planting. */
    async undo(workdayId: string, treeId: string, userId: string): Promise<void> {
      await deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, workdayId);
        const [tree] = await lockTrees(tx, [treeId]);
        if (!tree || tree.plantedWorkdayId !== w.id) throw new NotFoundError('Planting record');
        if (tree.stage !== 'planted' || (await tx.getRepository(TreeCheck).existsBy({ treeId }))) {
          throw new ConflictError(`${tree.tag} already has monitoring checks; correct those instead of undoing the planting`);
        }
        const { stage, tankId } = await previousPlace(tx, tree);
        await tx.getRepository(Tree).update({ id: treeId }, { stage, tankId, siteId: null, plantedOn: null, plantedBedElevationM: null, plantedWorkdayId: null });
        const at = deps.clock();
        await tx.getRepository(TreeEvent).insert([
          { treeId, kind: 'stage', at, byId: userId, fromStage: 'planted', toStage: stage, note: `Planting record for "${w.title}" undone` },
          ...(tankId ? [{ treeId, kind: 'move' as const, at, byId: userId, tankId, note: 'Back in the nursery' }] : []),
        ]);
      });
    },
  };
}
export type PlantingService = ReturnType<typeof createPlantingService>;
