import type { DataSource } from 'typeorm';
import type { MyHours } from '../../shared/schemas/my-hours.schema.js';
import type { Profile, UpdateProfileBody } from '../../shared/schemas/profile.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { hoursFromMinutes, minutesWorked } from '../domain/crew/hours.js';
import { waitlistPosition } from './crew-places.js';
import { toWorkdayDtos } from './workday-view.js';

const toProfile = (p: VolunteerProfile | null): Profile => ({
  dateOfBirth: p?.dateOfBirth ?? null,
  phone: p?.phone ?? null,
  emergencyContact: p?.emergencyContact ?? null,
  skills: p?.skills ?? [],
  remindersOptOut: p?.remindersOptOut ?? false,
});

/** A volunteer's own profile, workdays and hours. */
export function createMeService(deps: { db: DataSource }) {
  const profiles = deps.db.getRepository(VolunteerProfile);

  /** Trees each workday recorded as planted (an undone record no longer counts), by workday id. */
  async function plantedBy(workdayIds: string[]): Promise<Map<string, number>> {
    if (workdayIds.length === 0) return new Map();
    const counts = await deps.db.getRepository(Tree).createQueryBuilder('t')
      .select('t.planted_workday_id', 'workdayId').addSelect('COUNT(*)::int', 'trees')
      .where('t.planted_workday_id IN (:...workdayIds)', { workdayIds })
      .groupBy('t.planted_workday_id')
      .getRawMany<{ workdayId: string; trees: number }>();
    return new Map(counts.map((c) => [c.workdayId, c.trees]));
  }
  return {
    profile: async (userId: string) => toProfile(await profiles.findOneBy({ userId })),

    async updateProfile(userId: string, body: UpdateProfileBody): Promise<Profile> {
      const p = (await profiles.findOneBy({ userId })) ?? profiles.create({ userId, skills: [] });
      return toProfile(await profiles.save(profiles.merge(p, body)));
    },

    /** The workdays I am on or waiting for (cancelled workdays included, so I see the notice). */
    async workdays(userId: string) {
      const signups = await deps.db.getRepository(Signup).find({ where: [{ userId, status: 'confirmed' }, { userId, status: 'waitlisted' }], relations: { workday: true } });
      signups.sort((a, b) => a.workday.startsAt.getTime() - b.workday.startsAt.getTime());
      const dtos = await toWorkdayDtos(deps.db, signups.map((s) => s.workday));
      return Promise.all(
        signups.map(async (s, i) => ({
          workday: dtos[i]!,
          signup: { id: s.id, role: s.role, status: s.status, position: s.status === 'waitlisted' ? await waitlistPosition(deps.db.manager, s) : null },
        })),
      );
    },

    /** Hours per workday attended, and totals, optionally within a period. */
    async hours(userId: string, period: { from?: string; to?: string }): Promise<MyHours> {
      const qb = deps.db.getRepository(Signup).createQueryBuilder('s')
        .innerJoinAndMapOne('s.workday', Workday, 'w', 'w.id = s.workday_id')
        .where('s.user_id = :userId AND s.status = :st', { userId, st: 'confirmed' })
        .andWhere("w.status IN ('published', 'completed')")
        .orderBy('w.starts_at', 'DESC');
      if (period.from) qb.andWhere('w.starts_at >= :from', { from: new Date(period.from) });
      if (period.to) qb.andWhere('w.starts_at < :to', { to: new Date(period.to) });
      const signups = await qb.getMany();
      const planted = await plantedBy(signups.filter((s) => s.checkedInAt !== null && !s.noShow && s.workday.kind === 'planting').map((s) => s.workdayId));
      const rows = signups.map((s) => ({
        workdayId: s.workdayId, title: s.workday.title, startsAt: s.workday.startsAt.toISOString(), role: s.role, minutes: minutesWorked(s), noShow: s.noShow,
        crewTreesPlanted: planted.get(s.workdayId) ?? 0,
      }));
      const minutes = rows.reduce((sum, r) => sum + r.minutes, 0);
      const crewTreesPlanted = rows.reduce((sum, r) => sum + r.crewTreesPlanted, 0);
      return { rows, totalMinutes: minutes, totalHours: hoursFromMinutes(minutes), workdaysAttended: rows.filter((r) => r.minutes > 0).length, crewTreesPlanted };
    },
  };
}
export type MeService = ReturnType<typeof createMeService>;
