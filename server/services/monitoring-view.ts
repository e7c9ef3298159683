/** Loading a monitoring visit's trees and check counts into their response shapes. */
import { In, type EntityManager } from 'typeorm';
import type { CheckDto, VisitDto, VisitTree } from '../../shared/schemas/outcomes.schema.js';
import { MonitoringVisit } from '../db/entities/monitoring-visit.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { TreeCheck } from '../db/entities/tree-check.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { photoUrl, thumbUrl } from './nursery-context.js';

export type Counts = VisitDto['counts'];
const EMPTY: Counts = { alive: 0, lost: 0, missing: 0, checked: 0 };

export const toCheckDto = (c: TreeCheck): CheckDto => ({
  condition: c.condition, heightCm: c.heightCm, notes: c.notes, photoId: c.photoId, photoUrl: photoUrl(c.photoId), thumbUrl: thumbUrl(c.photoId),
});

export const toVisitTree = (t: Tree, check: TreeCheck | undefined): VisitTree => ({
  id: t.id, tag: t.tag, stage: t.stage, plantedOn: t.plantedOn ?? '', plantedBedElevationM: t.plantedBedElevationM, heightCm: t.heightCm, check: check ? toCheckDto(check) : null,
});

/** Checks per condition for each visit. */
export async function countsFor(tx: EntityManager, visitIds: readonly string[]): Promise<Map<string, Counts>> {
  if (visitIds.length === 0) return new Map();
  const rows: { visit_id: string; condition: 'alive' | 'lost' | 'missing'; n: string }[] = await tx
    .getRepository(TreeCheck)
    .createQueryBuilder('c')
    .select('c.visit_id', 'visit_id')
    .addSelect('c.condition', 'condition')
    .addSelect('COUNT(*)', 'n')
    .where('c.visit_id IN (:...ids)', { ids: visitIds })
    .groupBy('c.visit_id')
    .addGroupBy('c.condition')
    .getRawMany();
  const out = new Map<string, Counts>();
  for (const r of rows) {
    const c = out.get(r.visit_id) ?? { ...EMPTY };
    c[r.condition] += Number(r.n);
    c.checked += Number(r.n);
    out.set(r.visit_id, c);
  }
  return out;
}

export async function toVisitDtos(tx: EntityManager, visits: readonly MonitoringVisit[]): Promise<VisitDto[]> {
  const siteIds = [...new Set(visits.map((v) => v.siteId))];
  const sites = siteIds.length ? await tx.getRepository(Site).find({ where: { id: In(siteIds) }, select: { id: true, name: true } }) : [];
  const names = new Map(sites.map((s) => [s.id, s.name]));
  const counts = await countsFor(tx, visits.map((v) => v.id));
  return visits.map((v) => ({
    id: v.id, siteId: v.siteId, siteName: names.get(v.siteId) ?? '', workdayId: v.workdayId, visitedOn: v.visitedOn, notes: v.notes, counts: counts.get(v.id) ?? { ...EMPTY },
  }));
}

/**
 * The trees a visit covers: the site's trees planted on or before the visit date that are
 * `planted` or `alive` now, plus any tree checked at this visit (so trees it found lost stay on
 * its list). In tag order, each with its check at this visit.
 */
export async function visitTrees(tx: EntityManager, visit: MonitoringVisit): Promise<VisitTree[]> {
  const checks = await tx.getRepository(TreeCheck).findBy({ visitId: visit.id });
  const checked = checks.map((c) => c.treeId);
  const qb = tx
    .getRepository(Tree)
    .createQueryBuilder('t')
    .where("t.site_id = :siteId AND t.planted_on <= :on AND t.stage IN ('planted', 'alive')", { siteId: visit.siteId, on: visit.visitedOn })
    .orderBy('t.tag');
  if (checked.length > 0) qb.orWhere('t.id IN (:...checked)', { checked });
  const byTree = new Map(checks.map((c) => [c.treeId, c]));
  return (await qb.getMany()).map((t) => toVisitTree(t, byTree.get(t.id)));
}
