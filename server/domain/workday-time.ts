/** How a workday's time reads in messages: the site's zone, with the zone's abbreviation. */

const dateFormats = new Map<string, Intl.DateTimeFormat>();
const cached = (key: string, make: () => Intl.DateTimeFormat) => {
  let f = dateFormats.get(key);
  if (!f) dateFormats.set(key, (f = make()));
  return f;
};

// ICU puts a narrow no-break space before AM/PM; plain spaces read the same in every mail client.
const plain = (s: string) => s.replace(/[\u202f\u00a0]/g, ' ');

/** `Saturday, August 16, 2025` in the zone. */
export function longDate(at: Date, timeZone: string): string {
  const f = cached(`long|${timeZone}`, () => new Intl.DateTimeFormat('en-US', { timeZone, weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' }));
  return plain(f.format(at));
}

/** `Sat, Aug 16` in the zone, for subject lines. */
export function shortDate(at: Date, timeZone: string): string {
  const f = cached(`short|${timeZone}`, () => new Intl.DateTimeFormat('en-US', { timeZone, weekday: 'short', month: 'short', day: 'numeric' }));
  return plain(f.format(at));
}

/** Clock time and zone abbreviation, e.g. `{ time: '7:30 AM', zone: 'EDT' }`. */
export function clockTime(at: Date, timeZone: string): { time: string; zone: string } {
  const f = cached(`time|${timeZone}`, () => new Intl.DateTimeFormat('en-US', { timeZone, hour: 'numeric', minute: '2-digit', timeZoneName: 'short' }));
  const parts = f.formatToParts(at);
  const zone = parts.find((p) => p.type === 'timeZoneName')?.value ?? timeZone;
  const time = parts
    .filter((p) => p.type !== 'timeZoneName')
    .map((p) => p.value)
    .join('')
    .trim();
  return { time: plain(time), zone };
}

/**
 * Date and start–end in the site's zone, the abbreviation once (twice when it changes, as on a
 * daylight-saving night); an end on another local day carries its own date.
 * @example workdayWhen(new Date('2025-08-16T11:30:00Z'), new Date('2025-08-16T15:30:00Z'), 'America/New_York')
 * // 'Saturday, August 16, 2025, 7:30 AM – 11:30 AM EDT'
 */
export function workdayWhen(start: Date, end: Date, timeZone: string): string {
  const s = clockTime(start, timeZone);
  const e = clockTime(end, timeZone);
  const startDate = longDate(start, timeZone);
  const endDate = longDate(end, timeZone);
  const from = s.zone === e.zone && startDate === endDate ? s.time : `${s.time} ${s.zone}`;
  const to = startDate === endDate ? `${e.time} ${e.zone}` : `${endDate}, ${e.time} ${e.zone}`;
  return `${startDate}, ${from} – ${to}`;
}
