import { randomBytes } from 'node:crypto';
import { In, MoreThanOrEqual, type DataSource } from 'typeorm';
import type { Role } from '../../shared/schemas/user.schema.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { Signup } from '../db/entities/signup.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { NotFoundError } from '../errors.js';
import { renderCalendar } from './calendar-ics.js';
import { ensureProfile } from './reminder-opt-out.service.js';

/** Feeds keep past workdays this long, so entries do not vanish from calendars the day after. */
const FEED_HISTORY_MS = 60 * 86_400_000;
/** Asked of subscribing clients; many refresh less often whatever we say. */
const FEED_REFRESH_SECONDS = 3600;
const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/** iCalendar files: one workday, the organisation's public feed, and each person's private feed. */
export function createCalendarService(deps: { db: DataSource; appUrl: string; clock: () => Date }) {
  const workdays = deps.db.getRepository(Workday);
  const profiles = deps.db.getRepository(VolunteerProfile);
  const feedUrl = (token: string) => new URL(`/api/calendar/personal/${token}.ics`, deps.appUrl).toString();
  const since = () => new Date(deps.clock().getTime() - FEED_HISTORY_MS);
  const render = (name: string | undefined, entries: Parameters<typeof renderCalendar>[0]['entries'], refresh = true) =>
    renderCalendar({ appUrl: deps.appUrl, stamp: deps.clock(), name, entries, ...(refresh ? { refreshSeconds: FEED_REFRESH_SECONDS } : {}) });

  return {
    /** One workday; drafts exist only for coordinators and admins. */
    async workday(id: string, viewerRole?: Role): Promise<string> {
      const w = await workdays.findOne({ where: { id }, relations: { site: true } });
      const staff = viewerRole === 'coordinator' || viewerRole === 'admin';
      if (!w || (w.status === 'draft' && !staff)) throw new NotFoundError('Workday');
      return render(undefined, [{ workday: w, site: w.site }], false);
    },

    /** Published, cancelled and completed workdays from 60 days back onwards. */
    async organisationFeed(): Promise<string> {
      const org = await deps.db.getRepository(Organisation).findOneBy({ id: 1 });
      const rows = await workdays.find({
        where: { status: In(['published', 'cancelled', 'completed']), endsAt: MoreThanOrEqual(since()) },
        relations: { site: true },
        order: { startsAt: 'ASC' },
        take: 2000,
      });
      return render(`${org?.name ?? 'Ebbroot'} workdays`, rows.map((w) => ({ workday: w, site: w.site })));
    },

    /** The person's confirmed workdays, and waitlisted ones as TENTATIVE; 404 for an unknown or revoked token. */
    async personalFeed(token: string): Promise<string> {
      const profile = TOKEN_PATTERN.test(token) ? await profiles.findOneBy({ calendarToken: token }) : null;
      if (!profile) throw new NotFoundError('Calendar feed');
      const signups = await deps.db.getRepository(Signup).find({
        where: {
          userId: profile.userId,
          status: In(['confirmed', 'waitlisted']),
          workday: { status: In(['published', 'cancelled', 'completed']), endsAt: MoreThanOrEqual(since()) },
        },
        relations: { workday: { site: true } },
        order: { workday: { startsAt: 'ASC' } },
        take: 2000,
      });
      const entries = signups.map((s) => ({ workday: s.workday, site: s.workday.site, tentative: s.status === 'waitlisted' }));
      return render('My workdays', entries);
    },

    async feedUrlOf(userId: string): Promise<string | null> {
      const token = (await profiles.findOneBy({ userId }))?.calendarToken;
      return token ? feedUrl(token) : null;
    },

    /** A new secret URL for the person's feed; the previous one stops working at once. */
    async rotateFeed(userId: string): Promise<string> {
      const token = randomBytes(32).toString('base64url');
      await deps.db.transaction(async (tx) => {
        await ensureProfile(tx, userId);
        await tx.getRepository(VolunteerProfile).update({ userId }, { calendarToken: token });
      });
      return feedUrl(token);
    },

    async revokeFeed(userId: string): Promise<void> {
      await profiles.update({ userId }, { calendarToken: null });
    },
  };
}
export type CalendarService = ReturnType<typeof createCalendarService>;
