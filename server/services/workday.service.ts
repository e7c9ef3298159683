import type { DataSource } from 'typeorm';
import type { CreateWorkdayBody, WorkdayDto, WorkdayStatus } from '../../shared/schemas/workday.schema.js';
import { Workday } from '../db/entities/workday.entity.js';
import type { SiteService } from './site.service.js';

export const toWorkdayDto = (w: Workday): WorkdayDto => ({
  id: w.id,
  title: w.title,
  kind: w.kind,
  siteId: w.siteId,
  startsAt: w.startsAt.toISOString(),
  endsAt: w.endsAt.toISOString(),
  status: w.status,
});

const kindLabel = { planting: 'Planting', nursery: 'Nursery', monitoring: 'Monitoring', other: 'Workday' } as const;

/** Workdays; this first cut creates drafts from low-water windows and lists them. */
export function createWorkdayService(deps: { db: DataSource; sites: SiteService }) {
  const repo = deps.db.getRepository(Workday);
  return {
    async createDraft(body: CreateWorkdayBody, createdById: string): Promise<WorkdayDto> {
      const site = await deps.sites.get(body.siteId);
      const title = body.title ?? `${kindLabel[body.kind]} at ${site.name}`;
      const saved = await repo.save(
        repo.create({ title, kind: body.kind, siteId: site.id, startsAt: new Date(body.startsAt), endsAt: new Date(body.endsAt), status: 'draft', createdById }),
      );
      return toWorkdayDto(saved);
    },
    async list(filter: { status?: WorkdayStatus; siteId?: string }): Promise<WorkdayDto[]> {
      const rows = await repo.find({ where: { ...(filter.status ? { status: filter.status } : {}), ...(filter.siteId ? { siteId: filter.siteId } : {}) }, order: { startsAt: 'ASC' }, take: 500 });
      return rows.map(toWorkdayDto);
    },
  };
}
export type WorkdayService = ReturnType<typeof createWorkdayService>;
