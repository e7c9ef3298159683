/** Workdays as iCalendar (RFC 5545) events with ical-generator: UTC times, stable UID, SEQUENCE. */
import ical, { ICalEventStatus } from 'ical-generator';
import type { Site } from '../db/entities/site.entity.js';
import type { Workday } from '../db/entities/workday.entity.js';
import { calendarDescription, meetingPointOf, workdayUrl, type CrewMailWorkday } from '../domain/crew-mails.js';

export const ICS_CONTENT_TYPE = 'text/calendar; charset=utf-8';
// ical-generator writes the leading '-' itself (PRODID:-//Ebbroot//Workdays//EN).
const PROD_ID = '//Ebbroot//Workdays//EN';

/** `workday-<id>@<host of APP_URL>`: the same in every feed and attachment, so edits replace the entry. */
export const workdayUid = (appUrl: string, id: string) => `workday-${id}@${new URL(appUrl).hostname}`;

/** The mail texts' view of a workday: times read in the site's zone. */
export function crewMailWorkday(w: Workday, site: Site): CrewMailWorkday & { description: string } {
  return {
    id: w.id,
    title: w.title,
    startsAt: w.startsAt,
    endsAt: w.endsAt,
    timeZone: site.timeZone,
    siteName: site.name,
    meetingPoint: w.meetingPoint,
    launchName: site.launchName,
    whatToBring: w.whatToBring,
    cancelMessage: w.cancelMessage,
    description: w.description,
  };
}

export interface CalendarEntry {
  workday: Workday;
  site: Site;
  /** A waitlisted place shows as TENTATIVE in a personal feed. */
  tentative?: boolean;
}

function statusOf(entry: CalendarEntry): ICalEventStatus {
  if (entry.workday.status === 'cancelled') return ICalEventStatus.CANCELLED;
  return entry.tentative ? ICalEventStatus.TENTATIVE : ICalEventStatus.CONFIRMED;
}

function summaryOf(entry: CalendarEntry): string {
  if (entry.workday.status === 'cancelled') return `Cancelled: ${entry.workday.title}`;
  return entry.tentative ? `Waitlist: ${entry.workday.title}` : entry.workday.title;
}

/**
 * A VCALENDAR of workdays. Times are written in UTC (`…Z`): clients that mishandle TZID
 * without VTIMEZONE still show the right hour.
 */
export function renderCalendar(opts: { appUrl: string; stamp: Date; name?: string; entries: CalendarEntry[]; refreshSeconds?: number }): string {
  const cal = ical({ prodId: PROD_ID, name: opts.name ?? null, ttl: opts.refreshSeconds ?? null });
  for (const entry of opts.entries) {
    const { workday: w, site } = entry;
    const mailView = crewMailWorkday(w, site);
    cal.createEvent({
      id: workdayUid(opts.appUrl, w.id),
      sequence: w.sequence,
      stamp: opts.stamp,
      start: w.startsAt,
      end: w.endsAt,
      status: statusOf(entry),
      summary: summaryOf(entry),
      location: `${meetingPointOf(mailView)}, ${site.name}`,
      description: calendarDescription(mailView, opts.appUrl),
      url: workdayUrl(opts.appUrl, w.id),
    });
  }
  return cal.toString();
}

/** The `workday-<id>.ics` attachment of confirmation, promotion and change e-mails. */
export function workdayAttachment(appUrl: string, stamp: Date, workday: Workday, site: Site) {
  const content = renderCalendar({ appUrl, stamp, entries: [{ workday, site }] });
  return { filename: `workday-${workday.id}.ics`, content, contentType: ICS_CONTENT_TYPE };
}
