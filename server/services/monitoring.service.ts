import { Between, LessThanOrEqual, MoreThanOrEqual, type DataSource, type EntityManager, type FindOptionsWhere } from 'typeorm';
import type { CheckBody, CheckResult, CreateVisitBody, ListVisitsQuery, VisitDetail, VisitDto, VisitTree } from '../../shared/schemas/outcomes.schema.js';
import { MonitoringVisit } from '../db/entities/monitoring-visit.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { TreeCheck } from '../db/entities/tree-check.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { stageAfterChecks } from '../domain/outcomes/tree-condition.js';
import { localDate } from '../domain/tide/time-zone.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import type { PhotoService } from './photo.service.js';
import { countsFor, toVisitDtos, toVisitTree, visitTrees } from './monitoring-view.js';
import { lockTrees } from './tree-history.js';
import { treeTag } from './tree-tags.js';

const PLANTED = ['planted', 'alive', 'lost'];

/**
 * Tag as typed on a phone: case and spaces do not matter, and a bare number means the printed
 * series (`42` → `T-0042`).
 */
const normaliseTag = (typed: string) => {
  const t = typed.trim().toUpperCase().replace(/\s+/g, '');
  const digits = /^(?:T-?)?(\d{1,9})$/.exec(t);
  return digits ? treeTag(Number(digits[1])) : t;
};

/** Monitoring visits and the per-tree checks recorded at them; a tree's stage follows its latest check. */
export function createMonitoringService(deps: { db: DataSource; clock: () => Date; photos: PhotoService }) {
  async function findVisit(tx: EntityManager, id: string): Promise<MonitoringVisit> {
    const v = await tx.getRepository(MonitoringVisit).findOneBy({ id });
    if (!v) throw new NotFoundError('Monitoring visit');
    return v;
  }

  async function checkWorkday(tx: EntityManager, body: CreateVisitBody): Promise<void> {
    if (!body.workdayId) return;
    const w = await tx.getRepository(Workday).findOneBy({ id: body.workdayId });
    const problem = !w ? 'is not a workday' : w.kind !== 'monitoring' ? `is a ${w.kind} workday, not a monitoring one` : w.siteId !== body.siteId ? 'is at another site' : w.status === 'cancelled' ? 'is cancelled' : null;
    if (problem) throw new ValidationError('The workday cannot hold this visit', { workdayId: [problem] });
  }

  /** Sets the tree's stage from all its checks; writes a history entry when it changes. */
  async function followChecks(tx: EntityManager, tree: Tree, visit: MonitoringVisit, userId: string): Promise<Tree> {
    const checks = await tx.getRepository(TreeCheck).find({ where: { treeId: tree.id }, relations: { visit: true } });
    const stage = stageAfterChecks(tree.stage, checks.map((c) => ({ visitedOn: c.visit.visitedOn, recordedAt: c.createdAt.getTime(), condition: c.condition })));
    if (stage === tree.stage) return tree;
    await tx.getRepository(Tree).update({ id: tree.id }, { stage });
    await tx.getRepository(TreeEvent).insert({ treeId: tree.id, kind: 'stage', at: deps.clock(), byId: userId, fromStage: tree.stage, toStage: stage, note: `Monitoring visit on ${visit.visitedOn}` });
    return { ...tree, stage };
  }

  return {
    async create(body: CreateVisitBody, userId: string): Promise<VisitDto> {
      return deps.db.transaction(async (tx) => {
        const site = await tx.getRepository(Site).findOneBy({ id: body.siteId });
        if (!site) throw new ValidationError('Unknown site', { siteId: ['is not a site'] });
        await checkWorkday(tx, body);
        if (body.visitedOn > localDate(deps.clock().getTime(), site.timeZone)) throw new ValidationError('A visit cannot be recorded ahead of time', { visitedOn: ['cannot be in the future'] });
        const repo = tx.getRepository(MonitoringVisit);
        const saved = await repo.save(repo.create({ siteId: site.id, workdayId: body.workdayId ?? null, visitedOn: body.visitedOn, notes: body.notes, createdById: userId }));
        return (await toVisitDtos(tx, [saved]))[0]!;
      });
    },

    /** Visits, newest first (at most 500). */
    async list(q: ListVisitsQuery): Promise<VisitDto[]> {
      const where: FindOptionsWhere<MonitoringVisit> = { ...(q.siteId && { siteId: q.siteId }) };
      if (q.from && q.to) where.visitedOn = Between(q.from, q.to);
      else if (q.from) where.visitedOn = MoreThanOrEqual(q.from);
      else if (q.to) where.visitedOn = LessThanOrEqual(q.to);
      const visits = await deps.db.getRepository(MonitoringVisit).find({ where, order: { visitedOn: 'DESC', createdAt: 'DESC' }, take: 500 });
      return toVisitDtos(deps.db.manager, visits);
    },

    async detail(id: string): Promise<VisitDetail> {
      const tx = deps.db.manager;
      const visit = await findVisit(tx, id);
      return { visit: (await toVisitDtos(tx, [visit]))[0]!, trees: await visitTrees(tx, visit) };
    },

    /** A planted tree of the visit's site found by its tag number, with its check at this visit. */
    async lookup(id: string, typedTag: string): Promise<VisitTree> {
      const tx = deps.db.manager;
      const visit = await findVisit(tx, id);
      const tag = normaliseTag(typedTag);
      const tree = await tx.getRepository(Tree).createQueryBuilder('t').where('upper(t.tag) = :tag AND t.site_id = :siteId', { tag, siteId: visit.siteId }).getOne();
      if (!tree || !PLANTED.includes(tree.stage) || !tree.plantedOn || tree.plantedOn > visit.visitedOn) throw new NotFoundError(`Planted tree ${tag} at this site on the visit date`);
      return toVisitTree(tree, (await tx.getRepository(TreeCheck).findOneBy({ visitId: id, treeId: tree.id })) ?? undefined);
    },

    /** Records (or replaces) one tree's check at a visit, under the tree's row lock. */
    async check(visitId: string, treeId: string, body: CheckBody, userId: string): Promise<CheckResult> {
      return deps.db.transaction(async (tx) => {
        const visit = await findVisit(tx, visitId);
        const [tree] = await lockTrees(tx, [treeId]);
        if (!tree) throw new NotFoundError('Tree');
        if (tree.siteId !== visit.siteId || !tree.plantedOn || !PLANTED.includes(tree.stage)) throw new ConflictError(`${tree.tag} is not planted at this visit's site`);
        if (tree.plantedOn > visit.visitedOn) throw new ConflictError(`${tree.tag} was planted on ${tree.plantedOn}, after this visit`);
        await deps.photos.requireExists(tx, body.photoId);
        const values = { visitId, treeId, condition: body.condition, heightCm: body.heightCm ?? null, notes: body.notes, photoId: body.photoId ?? null };
        await tx.createQueryBuilder().insert().into(TreeCheck).values(values).orUpdate(['condition', 'height_cm', 'notes', 'photo_id'], ['visit_id', 'tree_id']).execute();
        const after = await followChecks(tx, tree, visit, userId);
        const check = await tx.getRepository(TreeCheck).findOneByOrFail({ visitId, treeId });
        return { tree: toVisitTree(after, check), counts: (await countsFor(tx, [visitId])).get(visitId)! };
      });
    },
  };
}
export type MonitoringService = ReturnType<typeof createMonitoringService>;
