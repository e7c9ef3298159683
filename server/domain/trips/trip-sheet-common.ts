/** What the trip sheet and the float plan share: lookups, planned times, reason labels, cautions. */
import { clockTime } from '../workday-time.js';
import type { ReasonRefsJson, TripRunJson } from './api.js';
import type { TripCraft } from './types.js';
import { craftName, sheetClock, sheetDate, zoneAt } from './trip-sheet-format.js';
import type { SheetCraft, SheetPerson, TripSheetInput } from './trip-sheet-types.js';

const REASON_LABELS: Record<string, string> = {
  'no-craft': 'No craft for it',
  'window-too-short': 'Window too short',
  'no-operator': 'No qualified operator',
  'no-paddler': 'No paddler',
  'owner-absent': 'Owner not on the crew',
  'no-seat': 'No seat left',
  'over-load': 'Over the load margin',
  'too-heavy': 'Too heavy for any craft',
  'guardian-not-aboard': 'Guardian not aboard',
  'planting-time': 'Too late to plant before the window closes',
  'left-ashore': 'Left ashore',
  'not-needed': 'Not needed',
};

/** A short label for a planner reason code; an unknown code reads as itself. */
export const reasonLabel = (reason: string) => REASON_LABELS[reason] ?? reason;

/**
 * The usual cautions (TRADE.md §2; DESIGN.md, Safety): one wearable life jacket per person on
 * the water (33 CFR 175.15), head for shore at the first thunder (common practice) and wait 30
 * minutes after the last (NWS lightning guidance), heat, mud and shell.
 */
export const CAUTIONS: readonly string[] = [
  'A wearable life jacket for everyone on the water, worn, kayaks and canoes included; children always wear theirs.',
  'Lightning: head for shore at the first thunder; stay off the water until 30 minutes after the last thunder.',
  'Heat: bring water, take shade and rest breaks, watch each other for heat illness and stop early when needed.',
  'Soft mud and oyster shell: closed shoes that stay on, gloves for pots; test each step, shell cuts deeply.',
  'Wind and weather: check the marine forecast before leaving; no trip under a small craft advisory.',
];

export const PREVAIL = "Local rules, permits and the licensed operator's judgement prevail over this plan.";

/** Room for a name, phone number or time written by hand. */
export const BLANK = '______________';

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
const UTC_CLOCK = /\b(\d{2}):(\d{2}) UTC\b/g;
const DAY_MS = 86_400_000;

function fromPlan(c: TripCraft): SheetCraft {
  const { id, kind, seats, maxLoadKg, potSlots, needsOperator } = c;
  const name = c.ownerId ? null : 'Craft no longer in the fleet';
  return { id, kind, seats, maxLoadKg, potSlots, needsOperator, name, hasCapacityPlate: false, draftM: c.draftM ?? null, colour: null, notes: '', ownerName: null };
}

/**
 * A planner reason as a sentence. The planner writes ids and UTC clock times, and lists both in
 * the reason's `refs`: the sheet names the craft and people it lists and puts the instant on the
 * zone's clock. A reason stored before `refs` existed falls back to every known id and the
 * instant of that clock nearest the window's start.
 */
function explain(named: (SheetPerson | SheetCraft)[], start: number, zoned: (at: number) => string, r: SheetReason): string {
  const listed = r.refs ? new Set([...(r.refs.craftIds ?? []), ...(r.refs.personIds ?? [])]) : null;
  const names = named
    .filter((n) => !listed || listed.has(n.id))
    .map((n) => [n.id, 'ownerName' in n ? craftName(n) : n.name] as const)
    .sort((a, b) => b[0].length - a[0].length);
  let text = r.detail;
  for (const [id, name] of names) text = text.replace(new RegExp(`\\b${escape(id)}\\b`, 'g'), () => name);
  const at = r.refs?.at === undefined ? null : Date.parse(r.refs.at);
  text = text.replace(UTC_CLOCK, (_m, h: string, m: string) => {
    if (at !== null) return zoned(at);
    const day = Math.floor(start / DAY_MS) * DAY_MS + (Number(h) * 60 + Number(m)) * 60_000;
    return zoned([day - DAY_MS, day, day + DAY_MS].reduce((a, b) => (Math.abs(b - start) < Math.abs(a - start) ? b : a)));
  });
  const sentence = text.charAt(0).toUpperCase() + text.slice(1);
  return `${reasonLabel(r.reason)}. ${sentence}${/[.!?]$/.test(sentence) ? '' : '.'}`;
}

/** A planner reason as stored in a plan. */
export interface SheetReason {
  reason: string;
  detail: string;
  refs?: ReasonRefsJson;
}

/** Lookups and the plan's key times, in the organisation's zone. */
export function sheetContext(input: TripSheetInput) {
  const { organisation: org, instance, plan } = input;
  const zone = zoneAt(instance.window.start, org.timeZone);
  const at = sheetClock(org.timeZone, zone);
  const zoned = (iso: string | number) => {
    const c = clockTime(new Date(iso), org.timeZone);
    return `${c.time} ${c.zone}`;
  };
  const people = new Map<string, SheetPerson>(input.people.map((p) => [p.id, p]));
  const craft = new Map<string, SheetCraft>(input.craft.map((c) => [c.id, c]));
  const nameOf = (id: string) => people.get(id)?.name ?? 'Unknown person';
  const runs = [...plan.runs].sort((a, b) => Date.parse(a.departAt) - Date.parse(b.departAt) || a.run - b.run);
  const runsOf = (craftId: string): TripRunJson[] => runs.filter((r) => r.craftId === craftId).sort((a, b) => a.run - b.run);
  // Plan order; a craft the lookups lack (removed since) still prints from the plan's figures.
  const ordered = instance.craft.map((c) => craft.get(c.id) ?? fromPlan(c));
  for (const c of ordered) craft.set(c.id, c);
  const used = ordered.filter((c) => runsOf(c.id).length > 0);
  const times = (pick: (r: TripRunJson) => string) => runs.map((r) => Date.parse(pick(r)));
  return {
    org,
    zone,
    at,
    zoned,
    date: sheetDate(instance.window.start, org.timeZone),
    nameOf,
    person: (id: string) => people.get(id),
    craftOf: (id: string) => craft.get(id),
    craftLabel: (id: string) => {
      const c = craft.get(id);
      return c ? craftName(c) : 'Unknown craft';
    },
    runs,
    runsOf,
    used,
    idle: ordered.filter((c) => !used.includes(c)),
    firstDepartAt: runs.length ? Math.min(...times((r) => r.departAt)) : null,
    lastReturnAt: runs.length ? Math.max(...times((r) => r.returnAt)) : null,
    window: `${at(instance.window.start)} – ${zoned(instance.window.end)}`,
    /** The planner's reason in print: names for ids, the zone's clock for UTC times. */
    explain: (r: SheetReason) => explain([...people.values(), ...craft.values()], Date.parse(instance.window.start), zoned, r),
  };
}
export type SheetContext = ReturnType<typeof sheetContext>;

/** `9:00 AM EDT`, or `not planned` when there is no such time. */
export const timeOrNone = (ctx: SheetContext, at: number | string | null) => (at === null ? 'not planned' : ctx.zoned(at));
