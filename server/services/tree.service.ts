import { In, type DataSource } from 'typeorm';
import type { ListTreesQuery, MeasurementBody, TreeDetail, TreeEventDto, TreeRow, UpdateTreeBody } from '../../shared/schemas/nursery.schema.js';
import { Tank } from '../db/entities/tank.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { User } from '../db/entities/user.entity.js';
import { NotFoundError } from '../errors.js';
import { photoUrl } from './nursery-context.js';
import type { PhotoService } from './photo.service.js';
import { lockTrees, measuredAt, recordMeasurements, treeRows } from './tree-history.js';
import { toEventDto, toTreeRow } from './tree-view.js';

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** What a PATCH changed, for the history line. */
function changeNote(b: UpdateTreeBody): string {
  const parts: string[] = [];
  if (b.potHeightCm !== undefined) parts.push(b.potHeightCm === null ? 'pot height cleared' : `pot height ${b.potHeightCm} cm`);
  if (b.potMassKg !== undefined) parts.push(b.potMassKg === null ? 'pot mass cleared' : `pot mass ${b.potMassKg} kg`);
  if (b.healthy !== undefined) parts.push(b.healthy ? 'marked healthy' : 'marked unhealthy');
  if (b.photoId !== undefined) parts.push(b.photoId === null ? 'photo removed' : 'new photo');
  return parts.join('; ');
}

/** The nursery ledger: listing, one tree with its history, edits and measurements. */
export function createTreeService(deps: { db: DataSource; clock: () => Date; photos: PhotoService }) {
  const repo = deps.db.getRepository(Tree);

  async function history(treeId: string): Promise<TreeEventDto[]> {
    const events = await deps.db.getRepository(TreeEvent).find({ where: { treeId }, order: { at: 'DESC', createdAt: 'DESC' } });
    const userIds = [...new Set(events.flatMap((e) => (e.byId ? [e.byId] : [])))];
    const tankIds = [...new Set(events.flatMap((e) => (e.tankId ? [e.tankId] : [])))];
    const people = userIds.length ? await deps.db.getRepository(User).find({ where: { id: In(userIds) }, select: { id: true, name: true } }) : [];
    const tanks = tankIds.length ? await deps.db.getRepository(Tank).find({ where: { id: In(tankIds) }, select: { id: true, name: true } }) : [];
    const byId = <T extends { id: string; name: string }>(rows: T[]) => new Map(rows.map((r) => [r.id, { id: r.id, name: r.name }]));
    return events.map((e) => toEventDto(e, byId(people), byId(tanks)));
  }

  return {
    async list(q: ListTreesQuery): Promise<{ trees: TreeRow[]; total: number }> {
      const qb = repo.createQueryBuilder('t').leftJoinAndSelect('t.tank', 'tank').leftJoinAndSelect('t.batch', 'batch');
      if (q.stage?.length) qb.andWhere('t.stage IN (:...stages)', { stages: q.stage });
      if (q.tankId) qb.andWhere('t.tank_id = :tankId', { tankId: q.tankId });
      if (q.batchId) qb.andWhere('t.batch_id = :batchId', { batchId: q.batchId });
      if (q.siteId) qb.andWhere('t.site_id = :siteId', { siteId: q.siteId });
      if (q.reservedWorkdayId) qb.andWhere('t.reserved_workday_id = :wid', { wid: q.reservedWorkdayId });
      if (q.q) qb.andWhere('t.tag ILIKE :q', { q: `%${likeEscape(q.q)}%` });
      const [trees, total] = await qb.orderBy('t.tag', 'ASC').skip((q.page - 1) * q.pageSize).take(q.pageSize).getManyAndCount();
      return { trees: trees.map(toTreeRow), total };
    },

    async detail(id: string): Promise<TreeDetail> {
      const tree = await repo.findOne({ where: { id }, relations: { tank: true, batch: true } });
      if (!tree) throw new NotFoundError('Tree');
      const events = await history(id);
      const measurements = events
        .filter((e) => e.kind === 'measurement' && (e.heightCm !== null || e.leafCount !== null || e.healthy !== null))
        .map(({ at, heightCm, leafCount, healthy }) => ({ at, heightCm, leafCount, healthy }))
        .reverse();
      return { tree: { ...toTreeRow(tree), photoUrl: photoUrl(tree.photoId), createdAt: tree.createdAt.toISOString() }, history: events, measurements };
    },

    async update(id: string, body: UpdateTreeBody, userId: string): Promise<TreeRow> {
      return deps.db.transaction(async (tx) => {
        const [tree] = await lockTrees(tx, [id]);
        if (!tree) throw new NotFoundError('Tree');
        await deps.photos.requireExists(tx, body.photoId);
        // The note is not a column of the tree: it only explains the change in the history line.
        const { note, ...changes } = body;
        await tx.getRepository(Tree).update({ id }, changes);
        const healthy = body.healthy ?? null;
        const line = [changeNote(changes), note].filter(Boolean).join(': ');
        await tx.getRepository(TreeEvent).insert({ treeId: id, kind: 'note', at: deps.clock(), byId: userId, healthy, photoId: body.photoId ?? null, note: line });
        return (await treeRows(tx, [id]))[0]!;
      });
    },

    /** Records a measurement; the tree's latest values follow unless it is older than the latest one. */
    async measure(id: string, body: MeasurementBody, userId: string): Promise<TreeRow> {
      return deps.db.transaction(async (tx) => {
        const [tree] = await lockTrees(tx, [id]);
        if (!tree) throw new NotFoundError('Tree');
        await deps.photos.requireExists(tx, body.photoId);
        const { at, ...values } = body;
        await recordMeasurements(tx, [{ treeId: id, values }], measuredAt(at, deps.clock()), userId);
        if (body.photoId) await tx.getRepository(Tree).update({ id }, { photoId: body.photoId });
        return (await treeRows(tx, [id]))[0]!;
      });
    },
  };
}
export type TreeService = ReturnType<typeof createTreeService>;
