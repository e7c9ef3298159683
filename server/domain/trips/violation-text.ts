/**
 * `violationText`: a broken rule of a trip plan in the coordinator's words. Craft and people by
 * name, masses in the organisation's unit (pounds where it works in feet, kilograms in metres),
 * times on the clock of its zone. Pure: names, units and zone come in as arguments.
 */
import type { LengthUnit } from '../../../shared/schemas/organisation.schema.js';
import { clockTime } from '../workday-time.js';
import { weight } from './trip-sheet-format.js';
import type { TripViolation } from './types.js';

export interface ViolationWords {
  craftName: (id: string) => string;
  personName: (id: string) => string;
  units: LengthUnit;
  timeZone: string;
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
const list = (items: readonly string[]) => (items.length < 3 ? items.join(' and ') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`);

type Say = (v: TripViolation, w: ViolationWords, where: string) => string;

const TIMING: Record<string, Say> = {
  depart: (v, w, where) => `${where} leaves at ${time(v.facts?.at, w)}, before ${v.facts?.runs ? `run ${v.facts.runs[0]} is back and loaded` : 'the window opens'} (${time(v.facts?.by, w)})`,
  land: (v, w, where) => `${where} lands at ${time(v.facts?.at, w)}; at ${v.facts?.speedKmh ?? '?'} km/h it lands at ${time(v.facts?.by, w)}`,
  return: (v, w, where) => `${where} is back at ${time(v.facts?.by, w)}, not ${time(v.facts?.at, w)}`,
};

function time(ms: number | undefined, w: ViolationWords): string {
  if (ms === undefined) return 'an unknown time';
  const { time: clock, zone } = clockTime(new Date(ms), w.timeZone);
  return `${clock} ${zone}`;
}

const mass = (kg: number | undefined, w: ViolationWords) => weight(kg ?? 0, w.units);
const people = (v: TripViolation, w: ViolationWords) => list((v.personIds ?? []).map(w.personName));

const SAY: Record<TripViolation['rule'], Say> = {
  'unknown-craft': (v) => `Run ${v.run ?? '?'} names a craft that is not in the fleet`,
  'unknown-person': (_v, _w, where) => `${where} lists someone who is not on the crew`,
  'run-order': (v, w) => `${w.craftName(v.craftId ?? '')}’s runs are numbered ${(v.facts?.runs ?? []).join(', ')}; they must be 1 to ${v.facts?.runs?.length ?? 0}`,
  timing: (v, w, where) => (TIMING[v.facts?.which ?? 'depart'] ?? TIMING.depart!)(v, w, where),
  seats: (v, _w, where) => `${where} carries ${plural(v.facts?.count ?? 0, 'person', 'people')} but has ${plural(v.facts?.limit ?? 0, 'seat', 'seats')}`,
  'pot-slots': (v, _w, where) => `${where} carries ${plural(v.facts?.count ?? 0, 'pot', 'pots')} but has ${plural(v.facts?.limit ?? 0, 'pot slot', 'pot slots')}`,
  load: (v, w, where) => {
    const f = v.facts ?? {};
    return `${where} would carry ${mass(f.loadKg, w)}, over its load margin of ${mass(f.limitKg, w)} (${Math.round((f.marginShare ?? 1) * 100)} % of its rated ${mass(f.ratedKg, w)})`;
  },
  'pots-total': (v, w, where) =>
    v.craftId ? `${where} lists a ${mass(v.facts?.loadKg, w)} pot, but no such pot is ready (or another run lists it)` : `The runs carry ${plural(v.facts?.count ?? 0, 'pot', 'pots')} but only ${v.facts?.limit ?? 0} are ready`,
  skipper: (v, w) => `Nobody stays aboard every run of ${w.craftName(v.craftId ?? '')} to bring it back between runs`,
  operator: (v, w) => `${w.craftName(v.craftId ?? '')} needs someone with the boat operator skill aboard every run; none is`,
  'own-kayak': (v, w) => `${w.craftName(v.craftId ?? '')} is ${people(v, w)}’s own: only they may paddle it, aboard every run`,
  paddler: (v, w) =>
    v.personIds?.length
      ? `${w.craftName(v.craftId ?? '')}: ${people(v, w)} alone would be over its load margin of ${mass(v.facts?.limitKg, w)}`
      : `${w.craftName(v.craftId ?? '')} needs an adult with the paddler skill aboard every run; none is`,
  'travels-once': (v, w, where) => {
    const who = people(v, w) || 'Someone';
    if (v.facts?.craftIds) return `${who} rides out in ${list(v.facts.craftIds.map(w.craftName))}; a person rides out once and comes back in the same craft`;
    if (v.facts?.runs) {
      const first = v.facts.runs[0] ?? 1;
      return `${who} rides runs ${v.facts.runs.join(', ')} of ${w.craftName(v.craftId ?? '')}: whoever rides more than one run crews every run from their first to the craft’s last (${first} to ${v.facts.limit ?? first})`;
    }
    return `${where} lists ${who} twice`;
  },
  guardian: (v, w, where) => {
    const [minor = '', guardian = ''] = v.personIds ?? [];
    if (!v.craftId) return `${w.personName(minor)} is a minor whose guardian ${w.personName(guardian)} is not on the crew`;
    return `${w.personName(minor)} is a minor on ${where} without their guardian ${w.personName(guardian)}`;
  },
  return: (v, w) => {
    const craft = w.craftName(v.craftId ?? '');
    if (v.facts?.loadKg !== undefined) return `${craft} brings ${mass(v.facts.loadKg, w)} of people back at the close, over its load margin of ${mass(v.facts.limitKg, w)}`;
    return `${craft} brings its ${plural(v.facts?.count ?? 0, 'person', 'people')} back at the close but has ${plural(v.facts?.limit ?? 0, 'seat', 'seats')}`;
  },
  window: (v, w, where) => `${where} is unloaded at ${time(v.facts?.at, w)}, after the window closes at ${time(v.facts?.by, w)}`,
  'planting-time': (v, w) => {
    const f = v.facts ?? {};
    return `${plural(f.count ?? 0, 'pot is', 'pots are')} unloaded from ${time(f.at, w)} on, but the crew at the site (${plural(f.pairs ?? 0, 'pair', 'pairs')} then) can plant only ${f.limit ?? 0} of them by ${time(f.by, w)}`;
  },
};

/**
 * The violation as a sentence for the coordinator.
 * @example violationText({ rule: 'seats', craftId: 'c1', run: 2, facts: { count: 3, limit: 2 }, message: '…' }, words)
 * // 'Heron run 2 carries 3 people but has 2 seats'
 */
export function violationText(v: TripViolation, w: ViolationWords): string {
  const where = v.craftId !== undefined && v.run !== undefined ? `${w.craftName(v.craftId)} run ${v.run}` : v.craftId ? w.craftName(v.craftId) : 'The plan';
  return SAY[v.rule](v, w, where);
}
