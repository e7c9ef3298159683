/** Reads iCalendar text the way a calendar client would, with ical.js (an RFC 5545 parser). */
import ICAL from 'ical.js';

export interface ParsedEvent {
  uid: string;
  sequence: number;
  status: string;
  summary: string;
  url: string;
  location: string;
  description: string;
  start: Date;
  end: Date;
  stamp: Date;
  /** Whether DTSTART, DTEND and DTSTAMP are UTC values (`…Z`, no TZID). */
  allUtc: boolean;
}

const isUtc = (ev: ICAL.Component, name: string) => {
  const prop = ev.getFirstProperty(name);
  const value = prop?.getFirstValue();
  return value instanceof ICAL.Time && value.zone === ICAL.Timezone.utcTimezone && prop?.getParameter('tzid') === undefined;
};

const timeOf = (ev: ICAL.Component, name: string) => {
  const value = ev.getFirstPropertyValue(name);
  if (!(value instanceof ICAL.Time)) throw new Error(`${name} is not a date-time`);
  return value.toJSDate();
};

/** Parses a VCALENDAR; throws unless it has VERSION:2.0 and a PRODID. */
export function parseCalendar(text: string): { name: string; events: ParsedEvent[] } {
  const cal = new ICAL.Component(ICAL.parse(text));
  if (cal.name !== 'vcalendar') throw new Error(`not a VCALENDAR but ${cal.name}`);
  if (cal.getFirstPropertyValue('version') !== '2.0' || !cal.getFirstPropertyValue('prodid')) throw new Error('VERSION:2.0 and PRODID are required');
  const events = cal.getAllSubcomponents('vevent').map((ev) => ({
    uid: String(ev.getFirstPropertyValue('uid')),
    sequence: Number(ev.getFirstPropertyValue('sequence')),
    status: String(ev.getFirstPropertyValue('status')),
    summary: String(ev.getFirstPropertyValue('summary')),
    url: String(ev.getFirstPropertyValue('url')),
    location: String(ev.getFirstPropertyValue('location')),
    description: String(ev.getFirstPropertyValue('description')),
    start: timeOf(ev, 'dtstart'),
    end: timeOf(ev, 'dtend'),
    stamp: timeOf(ev, 'dtstamp'),
    allUtc: ['dtstart', 'dtend', 'dtstamp'].every((n) => isUtc(ev, n)),
  }));
  return { name: String(cal.getFirstPropertyValue('x-wr-calname') ?? ''), events };
}
