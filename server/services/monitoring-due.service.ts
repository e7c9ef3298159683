import type { DataSource } from 'typeorm';
import type { MonitoringDueDto } from '../../shared/schemas/outcomes.schema.js';
import { MonitoringVisit } from '../db/entities/monitoring-visit.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { TreeCheck } from '../db/entities/tree-check.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { DEFAULT_TOLERANCE_DAYS } from '../domain/outcomes/milestones.js';
import { monitoringDue, type DueCohort } from '../domain/outcomes/monitoring-due.js';
import { localDate } from '../domain/tide/time-zone.js';
import { nurserySettings } from './nursery-context.js';

/** Planting cohorts whose next monitoring check is due, per site, for the coordinator's home. */
export function createMonitoringDueService(deps: { db: DataSource; clock: () => Date }) {
  return {
    async due(): Promise<MonitoringDueDto> {
      const db = deps.db;
      const today = localDate(deps.clock().getTime(), (await nurserySettings(db)).timeZone);
      const trees = await db.getRepository(Tree).createQueryBuilder('t')
        .select(['t.id', 't.siteId', 't.plantedOn', 't.stage'])
        .where("t.site_id IS NOT NULL AND t.planted_on IS NOT NULL AND t.stage IN ('planted', 'alive', 'lost')")
        .getMany();
      const checks: { tree_id: string; visited_on: string; condition: 'alive' | 'lost' | 'missing' }[] = await db.getRepository(TreeCheck).createQueryBuilder('c')
        .innerJoin(MonitoringVisit, 'v', 'v.id = c.visit_id')
        .select('c.tree_id', 'tree_id').addSelect("to_char(v.visited_on, 'YYYY-MM-DD')", 'visited_on').addSelect('c.condition', 'condition')
        .getRawMany();
      const due = monitoringDue(
        trees.map((t) => ({ id: t.id, siteId: t.siteId!, plantedOn: t.plantedOn!, lost: t.stage === 'lost' })),
        checks.map((c) => ({ treeId: c.tree_id, visitedOn: c.visited_on, condition: c.condition })),
        today,
      );
      const siteIds = [...new Set(due.map((d) => d.siteId))];
      const sites = new Map((await db.getRepository(Site).findBy(siteIds.map((id) => ({ id })))).map((s) => [s.id, s.name]));
      const last: { site_id: string; last: string }[] = siteIds.length
        ? await db.getRepository(MonitoringVisit).createQueryBuilder('v')
          .select('v.site_id', 'site_id').addSelect("to_char(MAX(v.visited_on), 'YYYY-MM-DD')", 'last')
          .where('v.site_id IN (:...ids)', { ids: siteIds }).groupBy('v.site_id').getRawMany()
        : [];
      const lastOn = new Map(last.map((r) => [r.site_id, r.last]));
      const bySite = new Map<string, DueCohort[]>();
      for (const d of due) bySite.set(d.siteId, [...(bySite.get(d.siteId) ?? []), d]);
      return {
        today,
        toleranceDays: DEFAULT_TOLERANCE_DAYS,
        sites: [...bySite.entries()].map(([siteId, cohorts]) => ({
          siteId, siteName: sites.get(siteId) ?? '', lastVisitOn: lastOn.get(siteId) ?? null,
          cohorts: cohorts.map(({ siteId: _site, ...c }) => c),
        })),
      };
    },
  };
}
export type MonitoringDueService = ReturnType<typeof createMonitoringDueService>;
