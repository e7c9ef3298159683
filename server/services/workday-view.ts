/** Workday rows → the API's WorkdayDto, with places per role counted in one query per batch. */
import { In, type DataSource } from 'typeorm';
import { CrewRole } from '../../shared/schemas/crew.schema.js';
import type { WorkdayDto } from '../../shared/schemas/workday.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import { Site } from '../db/entities/site.entity.js';
import { WorkdayRole } from '../db/entities/workday-role.entity.js';
import type { Workday } from '../db/entities/workday.entity.js';

type Counts = Map<string, { role: string; status: string; n: number }[]>;

async function countsFor(db: DataSource, ids: string[]): Promise<Counts> {
  const rows: { workday_id: string; role: string; status: string; n: string }[] = ids.length === 0 ? [] : await db
    .getRepository(Signup)
    .createQueryBuilder('s')
    .select(['s.workday_id AS workday_id', 's.role AS role', 's.status AS status', 'COUNT(*) AS n'])
    .where({ workdayId: In(ids) })
    .andWhere("s.status <> 'cancelled'")
    .groupBy('s.workday_id, s.role, s.status')
    .getRawMany();
  const out: Counts = new Map();
  for (const r of rows) out.set(r.workday_id, [...(out.get(r.workday_id) ?? []), { role: r.role, status: r.status, n: Number(r.n) }]);
  return out;
}

export async function toWorkdayDtos(db: DataSource, workdays: Workday[]): Promise<WorkdayDto[]> {
  const ids = workdays.map((w) => w.id);
  const [counts, roleRows, sites] = await Promise.all([
    countsFor(db, ids),
    ids.length ? db.getRepository(WorkdayRole).findBy({ workdayId: In(ids) }) : Promise.resolve([]),
    db.getRepository(Site).findBy({ id: In([...new Set(workdays.map((w) => w.siteId))]) }),
  ]);
  const siteById = new Map(sites.map((s) => [s.id, s]));
  return workdays.map((w) => {
    const c = counts.get(w.id) ?? [];
    const n = (status: string, role?: string) => c.filter((x) => x.status === status && (!role || x.role === role)).reduce((s, x) => s + x.n, 0);
    const caps = roleRows.filter((r) => r.workdayId === w.id);
    const roles = caps.length > 0
      ? caps.map((r) => ({ role: r.role, capacity: r.capacity, confirmed: n('confirmed', r.role), waitlisted: n('waitlisted', r.role) }))
      : CrewRole.options.map((role) => ({ role, capacity: w.capacity, confirmed: n('confirmed', role), waitlisted: n('waitlisted', role) }));
    const site = siteById.get(w.siteId);
    return {
      id: w.id,
      title: w.title,
      kind: w.kind,
      siteId: w.siteId,
      startsAt: w.startsAt.toISOString(),
      endsAt: w.endsAt.toISOString(),
      status: w.status,
      description: w.description,
      meetingPoint: w.meetingPoint || site?.launchName || '',
      whatToBring: w.whatToBring,
      minimumAge: w.minimumAge,
      capacity: w.capacity,
      cancelMessage: w.cancelMessage,
      site: { id: w.siteId, name: site?.name ?? '', launchName: site?.launchName ?? '', timeZone: site?.timeZone ?? 'UTC', latitude: site?.latitude ?? 0, longitude: site?.longitude ?? 0 },
      confirmed: n('confirmed'),
      waitlisted: n('waitlisted'),
      roles,
      roleCapped: caps.length > 0,
    };
  });
}
