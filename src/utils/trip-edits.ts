import type { TripRunInput } from '@shared/schemas/trips.schema';
import type { TripRunDto } from '@/api/trip-plans';
import { craftName, personName, type TripNames } from './trip-board';
import { formatLocalTime } from './zoned-time';

/** Where a person or a pot can be: a run (its key) or ashore, on no run. */
export const ASHORE = 'ashore';

/** A run's key on the board: craft and run number. */
export const runKey = (r: Pick<TripRunDto, 'craftId' | 'run'>) => `${r.craftId}#${r.run}`;

/** One hand edit of the board. */
export type TripEdit =
  | { kind: 'person'; personId: string; from: string; to: string }
  | { kind: 'pot'; from: string; to: string }
  | { kind: 'pots'; key: string; pots: number };

function withRun(runs: readonly TripRunDto[], key: string, change: (r: TripRunDto) => TripRunDto): TripRunDto[] {
  return runs.map((r) => (runKey(r) === key ? change(r) : r));
}

const hasRun = (runs: readonly TripRunDto[], key: string) => key === ASHORE || runs.some((r) => runKey(r) === key);

/**
 * The runs after `edit`, or null when it changes nothing (same place, unknown run, nothing to take).
 * Loads are left as they were: the server recomputes them when it accepts the runs.
 * @example applyEdit(runs, { kind: 'person', personId: 'ann', from: 'canoe#1', to: 'ashore' })
 */
export function applyEdit(runs: readonly TripRunDto[], edit: TripEdit): TripRunDto[] | null {
  if (edit.kind === 'pots') {
    const run = runs.find((r) => runKey(r) === edit.key);
    if (!run || run.pots === edit.pots || edit.pots < 0) return null;
    return withRun(runs, edit.key, (r) => ({ ...r, pots: edit.pots }));
  }
  if (edit.from === edit.to || !hasRun(runs, edit.from) || !hasRun(runs, edit.to)) return null;
  if (edit.kind === 'pot') {
    const from = runs.find((r) => runKey(r) === edit.from);
    if (from && from.pots < 1) return null;
    const taken = edit.from === ASHORE ? [...runs] : withRun(runs, edit.from, (r) => ({ ...r, pots: r.pots - 1 }));
    return edit.to === ASHORE ? taken : withRun(taken, edit.to, (r) => ({ ...r, pots: r.pots + 1 }));
  }
  const { personId } = edit;
  if (edit.from !== ASHORE && !runs.some((r) => runKey(r) === edit.from && r.people.includes(personId))) return null;
  if (edit.to !== ASHORE && runs.some((r) => runKey(r) === edit.to && r.people.includes(personId))) return null;
  const taken = edit.from === ASHORE ? [...runs] : withRun(runs, edit.from, (r) => ({ ...r, people: r.people.filter((p) => p !== personId) }));
  return edit.to === ASHORE ? taken : withRun(taken, edit.to, (r) => ({ ...r, people: [...r.people, personId] }));
}

/** A place in words: "Pelican run 2" or "ashore". */
export function placeLabel(key: string, names: TripNames): string {
  if (key === ASHORE) return 'ashore';
  const [craftId = '', run = ''] = key.split('#');
  return `${craftName(names, craftId)} run ${run}`;
}

/** The edit in words, for the message when it is refused. */
export function describeEdit(edit: TripEdit, names: TripNames): string {
  if (edit.kind === 'pots') return `setting ${placeLabel(edit.key, names)} to ${edit.pots} ${edit.pots === 1 ? 'pot' : 'pots'}`;
  const what = edit.kind === 'pot' ? 'one pot' : personName(names, edit.personId);
  return `moving ${what} from ${placeLabel(edit.from, names)} to ${placeLabel(edit.to, names)}`;
}

/** The runs as the PUT body wants them (loads are recomputed by the server). */
export function toRunInputs(runs: readonly TripRunDto[]): TripRunInput[] {
  return runs.map(({ craftId, run, departAt, landAt, returnAt, people, pots }) => ({ craftId, run, departAt, landAt, returnAt, people: [...people], pots }));
}

export interface MovePlace {
  key: string;
  label: string;
}

/** Every place a person can be moved to: each run in lane order, with its departure, then ashore. */
export function movePlaces(lanes: readonly { name: string; runs: readonly TripRunDto[] }[], timeZone: string): MovePlace[] {
  const runs = lanes.flatMap((lane) => lane.runs.map((r) => ({ key: runKey(r), label: `${lane.name} run ${r.run} (leaves ${formatLocalTime(r.departAt, timeZone)})` })));
  return [...runs, { key: ASHORE, label: 'Ashore (on no run)' }];
}
