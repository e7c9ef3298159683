import { CrewRole } from '@shared/schemas/crew.schema';
import type { WorkdayDto, WorkdayKind } from '@shared/schemas/workday.schema';
import { parseNumber } from './site-form';
import { formatLocalTime, localDateKey, zonedTime } from './zoned-time';

/** The workday form as typed: the day and clock times are read in the site's time zone. */
export interface WorkdayForm {
  siteId: string;
  kind: WorkdayKind;
  title: string;
  /** 'YYYY-MM-DD' on the site's calendar. */
  date: string;
  /** 'HH:MM' on the site's clock. */
  startTime: string;
  endTime: string;
  capacity: string;
  capEachRole: boolean;
  roleCaps: Record<CrewRole, string>;
  description: string;
  meetingPoint: string;
  whatToBring: string;
  minimumAge: string;
}

export interface WorkdayPrefill {
  siteId?: string;
  startsAt?: string;
  endsAt?: string;
}

const CLOCK = /^([01]\d|2[0-3]):([0-5]\d)$/;

function emptyRoleCaps(): Record<CrewRole, string> {
  return { 'own-kayak': '', seat: '', operator: '', shore: '', planter: '' };
}

/**
 * The instant the site's clock reads `time` on `date`, as ISO UTC; '' when either is missing, so
 * the schema reports the field.
 * @example localToIso('2025-03-04', '06:40', 'America/New_York') // '2025-03-04T11:40:00.000Z'
 */
export function localToIso(date: string, time: string, timeZone: string): string {
  const clock = CLOCK.exec(time);
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || !clock) return '';
  return zonedTime(date, timeZone, Number(clock[1]), Number(clock[2])).toISOString();
}

function isInstant(value: string | undefined): value is string {
  return value !== undefined && !Number.isNaN(Date.parse(value));
}

/** A new workday; a low-water window (or any `?startsAt=&endsAt=`) fills in the day and times. */
export function emptyWorkdayForm(prefill: WorkdayPrefill, timeZone: string): WorkdayForm {
  const form: WorkdayForm = {
    siteId: prefill.siteId ?? '',
    kind: 'planting',
    title: '',
    date: '',
    startTime: '',
    endTime: '',
    capacity: '12',
    capEachRole: false,
    roleCaps: emptyRoleCaps(),
    description: '',
    meetingPoint: '',
    whatToBring: '',
    minimumAge: '',
  };
  if (isInstant(prefill.startsAt)) {
    form.date = localDateKey(prefill.startsAt, timeZone);
    form.startTime = formatLocalTime(prefill.startsAt, timeZone);
  }
  if (isInstant(prefill.endsAt)) form.endTime = formatLocalTime(prefill.endsAt, timeZone);
  return form;
}

/** A saved workday in the form's terms; a meeting point that is just the site's launch shows empty. */
export function workdayToForm(w: WorkdayDto): WorkdayForm {
  const tz = w.site.timeZone;
  const roleCaps = emptyRoleCaps();
  if (w.roleCapped) for (const r of w.roles) roleCaps[r.role] = String(r.capacity);
  return {
    siteId: w.siteId,
    kind: w.kind,
    title: w.title,
    date: localDateKey(w.startsAt, tz),
    startTime: formatLocalTime(w.startsAt, tz),
    endTime: formatLocalTime(w.endsAt, tz),
    capacity: String(w.capacity),
    capEachRole: w.roleCapped,
    roleCaps,
    description: w.description,
    meetingPoint: w.meetingPoint === w.site.launchName ? '' : w.meetingPoint,
    whatToBring: w.whatToBring,
    minimumAge: w.minimumAge === 0 ? '' : String(w.minimumAge),
  };
}

export type RoleCapBody = { role: CrewRole; capacity: number }[];

/** Roles with a place (or an unreadable number, so the schema can say so), in the usual order. */
export function roleCapsBody(form: WorkdayForm): RoleCapBody {
  return CrewRole.options
    .map((role) => ({ role, capacity: parseNumber(form.roleCaps[role]) ?? 0 }))
    .filter((r) => Number.isNaN(r.capacity) || r.capacity !== 0);
}

/**
 * Turns on per-role caps set to the day's estimated needs (0: the role is not offered) and the
 * total cap to their sum, so the two agree.
 */
export function applyRoleNeeds(form: WorkdayForm, needs: Record<CrewRole, number>): void {
  form.capEachRole = true;
  for (const role of CrewRole.options) form.roleCaps[role] = needs[role] > 0 ? String(needs[role]) : '';
  const total = CrewRole.options.reduce((n, role) => n + Math.max(0, needs[role]), 0);
  if (total > 0) form.capacity = String(total);
}

/** Start and end as ISO UTC; the end is on the same day as the start (workdays are daylight work). */
export function formSpan(form: WorkdayForm, timeZone: string): { startsAt: string; endsAt: string } {
  return { startsAt: localToIso(form.date, form.startTime, timeZone), endsAt: localToIso(form.date, form.endTime, timeZone) };
}

/** A create body: numbers parsed, an empty title or minimum age left to the server's defaults. */
export function formToCreateBody(form: WorkdayForm, timeZone: string, status: 'draft' | 'published'): Record<string, unknown> {
  const body: Record<string, unknown> = { siteId: form.siteId, kind: form.kind, ...formSpan(form, timeZone) };
  if (form.title.trim() !== '') body.title = form.title;
  body.capacity = parseNumber(form.capacity) ?? Number.NaN;
  if (form.capEachRole) body.roles = roleCapsBody(form);
  body.description = form.description;
  body.meetingPoint = form.meetingPoint;
  body.whatToBring = form.whatToBring;
  const age = parseNumber(form.minimumAge);
  if (age !== undefined) body.minimumAge = age;
  body.status = status;
  return body;
}

const TEXT_KEYS = ['siteId', 'kind', 'title', 'description', 'meetingPoint', 'whatToBring'] as const;

/** Only what changed since `initial` (times compared as instants, so a new site zone counts too). */
export function formToUpdateBody(form: WorkdayForm, initial: WorkdayForm, timeZone: string, initialZone: string): Record<string, unknown> {
  const body: Record<string, unknown> = {};
  for (const key of TEXT_KEYS) if (form[key] !== initial[key]) body[key] = form[key];
  const span = formSpan(form, timeZone);
  const before = formSpan(initial, initialZone);
  if (span.startsAt !== before.startsAt || span.endsAt !== before.endsAt) Object.assign(body, span);
  if (form.capacity !== initial.capacity) body.capacity = parseNumber(form.capacity) ?? Number.NaN;
  if (form.minimumAge !== initial.minimumAge) body.minimumAge = parseNumber(form.minimumAge) ?? 0;
  const roles = form.capEachRole ? roleCapsBody(form) : [];
  const initialRoles = initial.capEachRole ? roleCapsBody(initial) : [];
  if (JSON.stringify(roles) !== JSON.stringify(initialRoles)) body.roles = roles;
  return body;
}

const PLAIN: readonly [RegExp, (m: RegExpExecArray) => string][] = [
  [/^invalid input: expected number, received nan$/i, () => 'Must be a number'],
  [/^invalid input: expected int/i, () => 'Must be a whole number'],
  [/^too big: expected number to be <=(\d+)$/i, (m) => `Must be at most ${m[1]}`],
  [/^too small: expected number to be >=(\d+)$/i, (m) => `Must be at least ${m[1]}`],
  [/^too big: expected string to have <=(\d+) characters$/i, (m) => `Must be at most ${m[1]} characters`],
  [/^must be an iso date-time$/i, () => 'Choose a day and a time'],
];

/** zod's built-in wording ("Too big: expected number to be <=500") in plain words. */
export function plainMessage(message: string): string {
  for (const [pattern, say] of PLAIN) {
    const m = pattern.exec(message);
    if (m) return say(m);
  }
  return message;
}
