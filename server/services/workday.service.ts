import { Between, In, LessThanOrEqual, MoreThanOrEqual, type DataSource, type FindOptionsWhere } from 'typeorm';
import type { CreateWorkdayBody, ListWorkdaysQuery, UpdateWorkdayBody, WorkdayDto, WorkdayStatus } from '../../shared/schemas/workday.schema.js';
import { WorkdayRole } from '../db/entities/workday-role.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { AppError, NotFoundError } from '../errors.js';
import type { CrewNotifier } from './crew-notifier.js';
import { lockWorkday, promoteFromWaitlist } from './crew-places.js';
import type { SiteService } from './site.service.js';
import { toWorkdayDtos } from './workday-view.js';

const kindLabel = { planting: 'Planting', nursery: 'Nursery', monitoring: 'Monitoring', other: 'Workday' } as const;
const PUBLIC_STATUSES: WorkdayStatus[] = ['published', 'cancelled', 'completed'];
const badState = (message: string) => new AppError(409, 'conflict', message);

/** Fields whose change the crew must hear about (and calendars must show). */
const NOTIFY_FIELDS = ['startsAt', 'endsAt', 'meetingPoint', 'siteId'] as const;
const FIELD_WORDS: Record<(typeof NOTIFY_FIELDS)[number], string> = { startsAt: 'start time', endsAt: 'finish time', meetingPoint: 'meeting point', siteId: 'site' };

export function createWorkdayService(deps: { db: DataSource; sites: SiteService; notifier: CrewNotifier; clock: () => Date }) {
  const repo = deps.db.getRepository(Workday);
  const one = async (w: Workday) => (await toWorkdayDtos(deps.db, [w]))[0]!;

  async function find(id: string, staff: boolean): Promise<Workday> {
    const w = await repo.findOneBy({ id });
    if (!w || (!staff && !PUBLIC_STATUSES.includes(w.status))) throw new NotFoundError('Workday');
    return w;
  }

  return {
    find,
    detail: async (id: string, staff: boolean) => one(await find(id, staff)),

    /** Everyone sees published, cancelled and completed workdays; staff may also ask for drafts. */
    async list(q: ListWorkdaysQuery, staff: boolean): Promise<WorkdayDto[]> {
      const where: FindOptionsWhere<Workday> = {
        status: q.status && (staff || PUBLIC_STATUSES.includes(q.status)) ? q.status : In(staff && !q.status ? [...PUBLIC_STATUSES, 'draft'] : PUBLIC_STATUSES),
        ...(q.siteId ? { siteId: q.siteId } : {}),
        ...(q.kind ? { kind: q.kind } : {}),
      };
      if (q.from && q.to) where.startsAt = Between(new Date(q.from), new Date(q.to));
      else if (q.from) where.startsAt = MoreThanOrEqual(new Date(q.from));
      else if (q.to) where.startsAt = LessThanOrEqual(new Date(q.to));
      return toWorkdayDtos(deps.db, await repo.find({ where, order: { startsAt: 'ASC' }, take: 500 }));
    },

    async create(body: CreateWorkdayBody, createdById: string): Promise<WorkdayDto> {
      const site = await deps.sites.get(body.siteId);
      const { roles, status, ...fields } = body;
      const saved = await deps.db.transaction(async (tx) => {
        const w = await tx.getRepository(Workday).save(tx.getRepository(Workday).create({
          ...fields,
          title: body.title ?? `${kindLabel[body.kind]} at ${site.name}`,
          startsAt: new Date(body.startsAt),
          endsAt: new Date(body.endsAt),
          status,
          publishedAt: status === 'published' ? deps.clock() : null,
          createdById,
        }));
        if (roles?.length) await tx.getRepository(WorkdayRole).insert(roles.map((r) => ({ ...r, workdayId: w.id })));
        return w;
      });
      return one(saved);
    },

    async update(id: string, body: UpdateWorkdayBody): Promise<WorkdayDto> {
      if (body.siteId) await deps.sites.get(body.siteId);
      const saved = await deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, id);
        if (w.status === 'cancelled' || w.status === 'completed') throw badState(`A ${w.status} workday cannot be edited`);
        const { roles, startsAt, endsAt, ...rest } = body;
        const next = { ...rest, ...(startsAt ? { startsAt: new Date(startsAt) } : {}), ...(endsAt ? { endsAt: new Date(endsAt) } : {}) };
        const changed = NOTIFY_FIELDS.filter((f) => f in next && String(next[f as keyof typeof next]) !== String(w[f]));
        if (endsAt === undefined && startsAt && new Date(startsAt) >= w.endsAt) throw new AppError(400, 'validation_failed', 'The workday must end after it starts', { endsAt: ['must be after the start'] });
        Object.assign(w, next);
        if (changed.length > 0 && w.status === 'published') w.sequence += 1;
        await tx.getRepository(Workday).save(w);
        if (roles) {
          await tx.getRepository(WorkdayRole).delete({ workdayId: id });
          if (roles.length) await tx.getRepository(WorkdayRole).insert(roles.map((r) => ({ ...r, workdayId: id })));
        }
        await promoteFromWaitlist(tx, w, deps.notifier);
        if (changed.length > 0 && w.status === 'published') await deps.notifier.workdayChanged(tx, id, `The ${changed.map((f) => FIELD_WORDS[f]).join(' and ')} changed.`);
        return w;
      });
      await deps.notifier.flush();
      return one(saved);
    },

    async publish(id: string): Promise<WorkdayDto> {
      const saved = await deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, id);
        if (w.status !== 'draft') throw badState(`Only a draft can be published; this workday is ${w.status}`);
        Object.assign(w, { status: 'published', publishedAt: deps.clock(), sequence: w.sequence + 1 });
        return tx.getRepository(Workday).save(w);
      });
      return one(saved);
    },

    async cancel(id: string, message: string): Promise<WorkdayDto> {
      const saved = await deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, id);
        if (w.status === 'cancelled' || w.status === 'completed') throw badState(`The workday is already ${w.status}`);
        const wasPublished = w.status === 'published';
        Object.assign(w, { status: 'cancelled', cancelMessage: message, sequence: w.sequence + 1 });
        await tx.getRepository(Workday).save(w);
        if (wasPublished) await deps.notifier.workdayCancelled(tx, id);
        return w;
      });
      await deps.notifier.flush();
      return one(saved);
    },

    async complete(id: string): Promise<WorkdayDto> {
      const saved = await deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, id);
        if (w.status !== 'published') throw badState(`Only a published workday can be completed; this one is ${w.status}`);
        w.status = 'completed';
        return tx.getRepository(Workday).save(w);
      });
      return one(saved);
    },
  };
}
export type WorkdayService = ReturnType<typeof createWorkdayService>;
