import type { DataSource } from 'typeorm';
import type { CrewRole } from '../../shared/schemas/crew.schema.js';
import { WorkdayRole } from '../../server/db/entities/workday-role.entity.js';
import { Workday } from '../../server/db/entities/workday.entity.js';
import { buildSite } from './site.factory.js';

const DAY = 86_400_000;

/** A published workday a week from now (at an invented test site unless one is given). */
export async function buildWorkday(
  db: DataSource,
  overrides: Partial<Workday> & { roles?: { role: CrewRole; capacity: number }[] } = {},
): Promise<Workday> {
  const { roles, ...fields } = overrides;
  const siteId = fields.siteId ?? (await buildSite(db)).id;
  const startsAt = fields.startsAt ?? new Date(Math.ceil((Date.now() + 7 * DAY) / 3_600_000) * 3_600_000);
  const repo = db.getRepository(Workday);
  const w = await repo.save(repo.create({
    title: 'Test planting',
    kind: 'planting',
    status: 'published',
    capacity: 10,
    publishedAt: new Date(),
    ...fields,
    siteId,
    startsAt,
    endsAt: fields.endsAt ?? new Date(startsAt.getTime() + 4 * 3_600_000),
  }));
  if (roles?.length) await db.getRepository(WorkdayRole).insert(roles.map((r) => ({ ...r, workdayId: w.id })));
  return w;
}
