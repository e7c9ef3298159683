import type { DataSource } from 'typeorm';
import { CREW_ROLE_LABELS } from '../../shared/schemas/crew.schema.js';
import { OutboxMessage } from '../db/entities/outbox-message.entity.js';
import { Signup } from '../db/entities/signup.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import { reminderMail } from '../domain/crew-mails.js';
import { crewMailWorkday } from './calendar-ics.js';
import { mailContext, organisationName, queueMails, type CrewMailSettings } from './crew-outbox.js';

/** How long before the start a reminder goes out. */
export const REMINDER_LEAD_MS = 48 * 3_600_000;

/**
 * Reminders for published workdays starting within the next 48 hours: one per confirmed
 * person who has not opted out, keyed `reminder:<workday>:<user>` so repeated runs (hourly,
 * at every start, on several instances) never send a second one.
 */
export function createCrewReminders(deps: CrewMailSettings & { db: DataSource; clock: () => Date }) {
  const settings: CrewMailSettings = { appUrl: deps.appUrl, secret: deps.secret };
  return {
    /** Queues the reminders now due; returns how many were new. */
    async run(): Promise<number> {
      const now = deps.clock();
      const due = await deps.db
        .getRepository(Signup)
        .createQueryBuilder('s')
        .innerJoinAndSelect('s.user', 'u')
        .innerJoinAndSelect('s.workday', 'w')
        .innerJoinAndSelect('w.site', 'site')
        .leftJoin(VolunteerProfile, 'p', 'p.user_id = s.user_id')
        .where('s.status = :confirmed AND w.status = :published', { confirmed: 'confirmed', published: 'published' })
        .andWhere('w.starts_at > :now AND w.starts_at <= :until', { now, until: new Date(now.getTime() + REMINDER_LEAD_MS) })
        .andWhere('COALESCE(p.reminders_opt_out, false) = false')
        .andWhere(
          (qb) =>
            `NOT EXISTS ${qb
              .subQuery()
              .select('1')
              .from(OutboxMessage, 'o')
              .where(`o.dedupe_key = 'reminder:' || s.workday_id || ':' || s.user_id`)
              .getQuery()}`,
        )
        .orderBy('w.starts_at', 'ASC')
        .limit(1000)
        .getMany();
      if (due.length === 0) return 0;
      const org = await organisationName(deps.db.manager);
      const mails = due.map((s) => ({
        kind: 'reminder',
        to: s.user.email,
        content: reminderMail(crewMailWorkday(s.workday, s.workday.site), mailContext(settings, org, s.user), CREW_ROLE_LABELS[s.role]),
        dedupeKey: `reminder:${s.workdayId}:${s.userId}`,
      }));
      return queueMails(deps.db.manager, mails);
    },
  };
}
export type CrewReminders = ReturnType<typeof createCrewReminders>;
