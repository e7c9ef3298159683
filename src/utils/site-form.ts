import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { CreateSiteBody, Site } from '@shared/schemas/site.schema';
import { fromDisplayDistance, toDisplayDistance } from './tide-format';
import { fromDisplayLength, toDisplayLength } from './units';

/** The site form as typed: text boxes hold strings in the organisation's units until sent. */
export interface SiteForm {
  name: string;
  latitude: string;
  longitude: string;
  timeZone: string;
  stationId: string;
  timeOffsetMinutes: string;
  heightOffset: string;
  bedElevation: string;
  routeElevation: string;
  workingDepth: string;
  craftDraft: string;
  draftMargin: string;
  minWindowMinutes: string;
  includeCivilTwilight: boolean;
  launchName: string;
  launchDistance: string;
  salinityPpt: string;
  notes: string;
}

type Kind = 'text' | 'number' | 'length' | 'distance' | 'nullableNumber';
/** Every form box except the civil-twilight switch holds text. */
type TextField = Exclude<keyof SiteForm, 'includeCivilTwilight'>;
export type SiteBodyKey = keyof CreateSiteBody;

/** Each body field, the form box it comes from and how to convert it (the switch is handled apart). */
const FIELDS: readonly (readonly [Exclude<SiteBodyKey, 'includeCivilTwilight'>, TextField, Kind])[] = [
  ['name', 'name', 'text'],
  ['latitude', 'latitude', 'number'],
  ['longitude', 'longitude', 'number'],
  ['timeZone', 'timeZone', 'text'],
  ['stationId', 'stationId', 'text'],
  ['timeOffsetMinutes', 'timeOffsetMinutes', 'number'],
  ['heightOffsetM', 'heightOffset', 'length'],
  ['bedElevationM', 'bedElevation', 'length'],
  ['routeElevationM', 'routeElevation', 'length'],
  ['workingDepthM', 'workingDepth', 'length'],
  ['craftDraftM', 'craftDraft', 'length'],
  ['draftMarginM', 'draftMargin', 'length'],
  ['minWindowMinutes', 'minWindowMinutes', 'number'],
  ['launchName', 'launchName', 'text'],
  ['launchDistanceM', 'launchDistance', 'distance'],
  ['salinityPpt', 'salinityPpt', 'nullableNumber'],
  ['notes', 'notes', 'text'],
];

/** Body fields holding a length in metres, whose messages name metres (see localiseLengthMessage). */
export const LENGTH_KEYS: readonly SiteBodyKey[] = ['heightOffsetM', 'bedElevationM', 'routeElevationM', 'workingDepthM', 'craftDraftM', 'draftMarginM'];

/**
 * Text from a number box: '' → undefined, anything unreadable → NaN (so the schema says
 * "must be a number"). Accepts a true minus sign and a decimal comma.
 */
export function parseNumber(text: string): number | undefined {
  let t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return undefined;
  if (/^-?\d+,\d+$/.test(t)) t = t.replace(',', '.');
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(t) ? Number(t) : Number.NaN;
}

/** A number for a text box, rounded so a converted value reads cleanly (0.3 m → '0.98' ft). */
function show(value: number, digits = 2): string {
  return String(Number(value.toFixed(digits)));
}

function toValue(text: string, kind: Kind, units: LengthUnit): unknown {
  if (kind === 'text') return text;
  const n = parseNumber(text);
  if (kind === 'nullableNumber') return n ?? null;
  if (n === undefined || kind === 'number') return n;
  return kind === 'length' ? fromDisplayLength(n, units) : fromDisplayDistance(n, units);
}

function toText(value: string | number | null, kind: Kind, units: LengthUnit): string {
  if (typeof value === 'string') return value;
  if (value === null) return '';
  if (kind === 'length') return show(toDisplayLength(value, units));
  if (kind === 'distance') return show(toDisplayDistance(value, units));
  return String(value);
}

/** The form for a new site, with the schema's defaults shown in the organisation's units. */
export function emptySiteForm(timeZone: string, units: LengthUnit): SiteForm {
  return {
    name: '',
    latitude: '',
    longitude: '',
    timeZone,
    stationId: '',
    timeOffsetMinutes: '0',
    heightOffset: '0',
    bedElevation: '',
    routeElevation: '',
    workingDepth: show(toDisplayLength(0.3, units)),
    craftDraft: show(toDisplayLength(0.15, units)),
    draftMargin: show(toDisplayLength(0.1, units)),
    minWindowMinutes: '120',
    includeCivilTwilight: false,
    launchName: '',
    launchDistance: '',
    salinityPpt: '',
    notes: '',
  };
}

/** A saved site in the form's terms, for editing. */
export function siteToForm(site: Site, units: LengthUnit): SiteForm {
  const form = emptySiteForm(site.timeZone, units);
  for (const [key, field, kind] of FIELDS) form[field] = toText(site[key], kind, units);
  form.includeCivilTwilight = site.includeCivilTwilight;
  return form;
}

/** A create body: metres and numbers; empty optional boxes are left out so the server's defaults apply. */
export function formToCreateBody(form: SiteForm, units: LengthUnit): Record<string, unknown> {
  const body: Record<string, unknown> = { includeCivilTwilight: form.includeCivilTwilight };
  for (const [key, field, kind] of FIELDS) {
    const value = toValue(form[field], kind, units);
    if (value !== undefined) body[key] = value;
  }
  return body;
}

/** An update body with only the boxes that changed since `initial`; a cleared number box fails validation. */
export function formToUpdateBody(form: SiteForm, initial: SiteForm, units: LengthUnit): Record<string, unknown> {
  const body: Record<string, unknown> = {};
  if (form.includeCivilTwilight !== initial.includeCivilTwilight) body.includeCivilTwilight = form.includeCivilTwilight;
  for (const [key, field, kind] of FIELDS) {
    if (form[field] === initial[field]) continue;
    const value = toValue(form[field], kind, units);
    body[key] = value === undefined ? Number.NaN : value;
  }
  return body;
}

/**
 * The fields whose schema has a `.default()`. Zod 4 fills defaults even inside `.partial()`, so an
 * UpdateSiteBody that leaves one out would reset it to the default; edits therefore carry them at
 * their saved values (exact metres, not re-converted from the rounded boxes).
 */
export const DEFAULTED_KEYS = [
  'timeOffsetMinutes',
  'heightOffsetM',
  'launchName',
  'launchDistanceM',
  'workingDepthM',
  'craftDraftM',
  'draftMarginM',
  'minWindowMinutes',
  'includeCivilTwilight',
  'salinityPpt',
  'notes',
] as const satisfies readonly SiteBodyKey[];

/** An update body with every defaulted field present: the saved value unless the edit changed it. */
export function withSavedDefaults(changes: Record<string, unknown>, site: Site): Record<string, unknown> {
  const saved: Record<string, unknown> = {};
  for (const key of DEFAULTED_KEYS) saved[key] = site[key];
  return { ...saved, ...changes };
}

/**
 * The schema's limits are written in metres; in a form that takes feet, say them in feet.
 * @example localiseLengthMessage('Must be at most 5 m', 'ft') // 'Must be at most 16.4 ft'
 */
export function localiseLengthMessage(message: string, units: LengthUnit): string {
  if (units === 'm') return message;
  return message.replace(/(-?\d+(?:\.\d+)?) m\b/g, (_all, n: string) => {
    const feet = toDisplayLength(Number(n), 'ft');
    return `${feet < 0 ? '\u2212' : ''}${show(Math.abs(feet), 1)} ft`;
  });
}
