/**
 * "Your tree is planted": one e-mail per sponsored tree once it is in the ground, with the site,
 * the date and the predicted tide there that day. Pure: the caller passes the tide.
 */
import { mailLayout, type MailContent } from '../mail-layout.js';
import { clockTime } from '../workday-time.js';

export interface PlantedTide {
  timeMs: number;
  /** In `unit`, above the station's MLLW. */
  height: number;
  type: 'high' | 'low';
}

export interface PlantedNews {
  donorName: string;
  tag: string;
  siteName: string;
  /** Local date `YYYY-MM-DD` at the site. */
  plantedOn: string;
  timeZone: string;
  unit: 'ft' | 'm';
  /** High and low waters of that local day at the site, in time order. */
  tides: PlantedTide[];
  stationName: string;
  dedication: string | null;
  organisationName: string;
}

/** `Saturday, August 16, 2025`: a calendar date read as that date, whatever the zone. */
function calendarDate(isoDate: string): string {
  return new Intl.DateTimeFormat('en-US', { timeZone: 'UTC', weekday: 'long', month: 'long', day: 'numeric', year: 'numeric' }).format(new Date(`${isoDate}T12:00:00Z`));
}

const signed = (x: number) => (x < 0 ? `−${Math.abs(x).toFixed(1)}` : x.toFixed(1));

/** `Low 6:12 AM EDT, −0.3 ft` */
export function tideLine(t: PlantedTide, timeZone: string, unit: 'ft' | 'm'): string {
  const at = clockTime(new Date(t.timeMs), timeZone);
  return `${t.type === 'low' ? 'Low' : 'High'} ${at.time} ${at.zone}, ${signed(t.height)} ${unit}`;
}

export function plantedMail(n: PlantedNews, link: { href: string; label: string }): MailContent {
  const date = calendarDate(n.plantedOn);
  const greeting = `Hello ${n.donorName},`;
  const lines = [
    `The tree you sponsored, tag ${n.tag}, was planted out at ${n.siteName} on ${date}. Thank you for helping the shoreline grow back.`,
    'Trees go out in heavy grow-out pots on daylight low tides, set so their top leaves stay above the water at all but the highest tides.',
  ];
  const tideText = n.tides.length ? n.tides.map((t) => tideLine(t, n.timeZone, n.unit)).join('; ') : 'not available for that day';
  const rows: [string, string][] = [
    ['Tree', n.tag],
    ['Site', n.siteName],
    ['Planted', date],
    ['Tide that day', tideText],
  ];
  if (n.dedication) rows.push(['Dedication', n.dedication]);
  const note = `Tide times and heights are predictions for ${n.siteName} from the harmonic constants of tide station ${n.stationName}, heights above mean lower low water (MLLW); observed water can differ with wind and weather.`;
  const signature = `${n.organisationName} · Ebbroot`;
  const text = [greeting, lines.join('\n\n'), rows.map(([k, v]) => `${k}: ${v}`).join('\n'), note, `${link.label}: ${link.href}`, signature].join('\n\n');
  const html = mailLayout({ greeting, lines, details: rows, link, smallPrint: [{ text: note }], signature });
  return { subject: `Your tree ${n.tag} is planted at ${n.siteName}`.slice(0, 300), text: `${text}\n`, html };
}
