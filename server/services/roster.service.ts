import type { DataSource } from 'typeorm';
import type { RecentSignup } from '../../shared/schemas/recent-signups.schema.js';
import type { RosterRow } from '../../shared/schemas/roster.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import { User } from '../db/entities/user.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { minutesWorked } from '../domain/crew/hours.js';

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** Roster rows of a workday: confirmed by role and name, then the waitlist in line order. */
export function createRosterService(deps: { db: DataSource; clock: () => Date }) {
  return {
    async roster(workdayId: string): Promise<RosterRow[]> {
      const rows = await deps.db
        .getRepository(Signup)
        .createQueryBuilder('s')
        .innerJoinAndMapOne('s.user', User, 'u', 'u.id = s.user_id')
        .leftJoinAndMapOne('s.profile', VolunteerProfile, 'p', 'p.user_id = s.user_id')
        .where('s.workday_id = :workdayId', { workdayId })
        .andWhere("s.status <> 'cancelled'")
        .orderBy("CASE WHEN s.status = 'confirmed' THEN 0 ELSE 1 END")
        .addOrderBy("CASE WHEN s.status = 'confirmed' THEN s.role END")
        .addOrderBy("CASE WHEN s.status = 'confirmed' THEN u.name END")
        .addOrderBy('s.queued_at', 'ASC')
        .addOrderBy('s.id', 'ASC')
        .getMany();
      const guardians = new Map(rows.map((s) => [s.userId, s.user.name]));
      const positions = new Map<string, number>();
      return rows.map((s): RosterRow => {
          const profile = (s as Signup & { profile?: VolunteerProfile }).profile;
          // Rows come in line order, so a running count per role is each person's place in line.
          const position = s.status === 'waitlisted' ? (positions.get(s.role) ?? 0) + 1 : null;
          if (position) positions.set(s.role, position);
          return {
            signupId: s.id, userId: s.userId, name: s.user.name, email: s.user.email, emailVerified: s.user.emailVerifiedAt !== null,
            role: s.role, status: s.status, position,
            waiverVersion: s.waiverVersion, waiverSignedName: s.waiverSignedName, waiverSignedAt: s.waiverSignedAt.toISOString(),
            isMinor: s.isMinor, guardianName: s.guardian?.name ?? (s.guardianUserId ? (guardians.get(s.guardianUserId) ?? null) : null),
            ageNotGiven: !profile?.dateOfBirth, skills: profile?.skills ?? [], ownCraft: s.ownCraft, operatorQualification: s.operatorQualification,
            emergencyContact: profile?.emergencyContact ?? null, phone: profile?.phone ?? null, note: s.note,
            checkedInAt: iso(s.checkedInAt), checkedOutAt: iso(s.checkedOutAt), noShow: s.noShow,
            minutes: minutesWorked(s), minutesOverridden: s.minutesOverride !== null,
          };
        });
    },

    /** First names and roles of the confirmed crew, for fellow volunteers. */
    async crew(workdayId: string) {
      const rows = await deps.db.getRepository(Signup).find({ where: { workdayId, status: 'confirmed' }, relations: { user: true }, order: { queuedAt: 'ASC' } });
      return rows.map((s) => ({ firstName: s.user.name.split(/\s+/)[0] ?? '', role: s.role }));
    },

    /**
     * The latest sign-ups and cancellations on published workdays that haven't ended, newest
     * first: each place counts once, at its cancellation if cancelled, else when it was taken.
     */
    async recent(limit: number): Promise<RecentSignup[]> {
      const rows = await deps.db
        .getRepository(Signup)
        .createQueryBuilder('s')
        .innerJoinAndMapOne('s.user', User, 'u', 'u.id = s.user_id')
        .innerJoinAndMapOne('s.workday', Workday, 'w', 'w.id = s.workday_id')
        .where("w.status = 'published' AND w.ends_at > :now", { now: deps.clock() })
        .orderBy('COALESCE(s.cancelled_at, s.created_at)', 'DESC')
        .addOrderBy('s.queued_at', 'DESC')
        .addOrderBy('s.id', 'ASC')
        .limit(limit)
        .getMany();
      return rows.map((s) => ({
        signupId: s.id, name: s.user.name, role: s.role, status: s.status, at: (s.cancelledAt ?? s.createdAt).toISOString(),
        workday: { id: s.workday.id, title: s.workday.title, startsAt: s.workday.startsAt.toISOString() },
      }));
    },
  };
}
export type RosterService = ReturnType<typeof createRosterService>;
