/**
 * Pots of different masses, grouped for the planner. Per-tree masses would give the MILP one
 * pot variable per run and distinct mass; instead the pots are grouped into at most
 * `MAX_POT_CLASSES` classes of neighbouring masses, and every pot counts at the mass of the
 * heaviest pot in its class — its mass is rounded UP, never down — so a run the planner loads
 * within its margin is within it with the real pots too. The grouping keeps the total rounding
 * as small as it can (an exact dynamic programme over the sorted distinct masses). Runs then
 * report their real pots' masses (`exactPotMasses`).
 */
import type { TripPots } from './types.js';

/** Enough to follow a nursery's spread of pot masses while keeping the MILP small. */
export const MAX_POT_CLASSES = 4;

export interface PotClass {
  /** The heaviest pot of the class: what every pot of it counts as. */
  massKg: number;
  count: number;
  /** The real masses of its pots, heaviest first. */
  masses: number[];
}

const usable = (m: number) => Number.isFinite(m) && m > 0;

/**
 * Every pot's mass: the recorded ones (at most `count`), then `massKg` for the rest.
 * @example potMasses({ count: 3, massKg: 27, masses: [31] }) // [31, 27, 27]
 */
export function potMasses(pots: TripPots): number[] {
  const count = Math.max(0, Math.floor(pots.count));
  const recorded = (pots.masses ?? []).filter(usable).slice(0, count);
  return [...recorded, ...new Array<number>(count - recorded.length).fill(pots.massKg)];
}

/** Whether the pots carry masses of their own (else all weigh `massKg`). */
export const hasPotMasses = (pots: TripPots) => (pots.masses ?? []).some(usable) && Math.floor(pots.count) > 0;

/** Best split of sorted distinct values into exactly k contiguous groups (k ≤ values); each group's last index. */
function bestCuts(values: readonly number[], weights: readonly number[], k: number): number[] {
  const n = values.length;
  const W = [0];
  const S = [0];
  values.forEach((v, i) => {
    W.push((W[i] ?? 0) + (weights[i] ?? 0));
    S.push((S[i] ?? 0) + (weights[i] ?? 0) * v);
  });
  // Kilograms added when values a..b (inclusive) all count as values[b].
  const cost = (a: number, b: number) => (values[b] ?? 0) * ((W[b + 1] ?? 0) - (W[a] ?? 0)) - ((S[b + 1] ?? 0) - (S[a] ?? 0));
  let best = values.map((_, b) => cost(0, b));
  const from: number[][] = [];
  for (let g = 1; g < k; g++) {
    const next = values.map(() => Infinity);
    const back = values.map(() => -1);
    for (let b = g; b < n; b++) {
      for (let a = g; a <= b; a++) {
        const c = (best[a - 1] ?? Infinity) + cost(a, b);
        if (c < (next[b] ?? Infinity) - 1e-9) [next[b], back[b]] = [c, a - 1];
      }
    }
    best = next;
    from.push(back);
  }
  const ends = [n - 1];
  for (let g = k - 1, b = n - 1; g >= 1; g--) {
    b = from[g - 1]?.[b] ?? -1;
    ends.unshift(b);
  }
  return ends;
}

/**
 * The pot classes of an instance, lightest first (one class when all pots weigh the same).
 * @example potClasses({ count: 3, massKg: 27, masses: [31] }) // [{ massKg: 27, count: 2, … }, { massKg: 31, count: 1, … }]
 */
export function potClasses(pots: TripPots, maxClasses = MAX_POT_CLASSES): PotClass[] {
  const all = potMasses(pots).sort((a, b) => a - b);
  if (all.length === 0) return usable(pots.massKg) ? [{ massKg: pots.massKg, count: 0, masses: [] }] : [];
  const tally = new Map<number, number>();
  for (const m of all) tally.set(m, (tally.get(m) ?? 0) + 1);
  const values = [...tally.keys()];
  const weights = values.map((v) => tally.get(v) ?? 0);
  const ends = bestCuts(values, weights, Math.max(1, Math.min(maxClasses, values.length)));
  let start = 0;
  return ends.map((end) => {
    const top = values[end] ?? 0;
    const masses = all.filter((m) => m >= (values[start] ?? 0) && m <= top).sort((a, b) => b - a);
    start = end + 1;
    return { massKg: top, count: masses.length, masses };
  });
}

/**
 * Real masses for runs given their pots per class, in the order given: each run takes the
 * heaviest pots still unassigned in each class (any choice within a class is within the margin).
 */
export function exactPotMasses(classes: readonly PotClass[], mixes: readonly (readonly number[])[]): number[][] {
  const next = classes.map(() => 0);
  return mixes.map((mix) =>
    classes.flatMap((cl, j) => {
      const n = mix[j] ?? 0;
      const taken = cl.masses.slice(next[j], (next[j] ?? 0) + n);
      next[j] = (next[j] ?? 0) + n;
      return taken;
    }),
  );
}

/**
 * Pots per class for one run, lightest first (the most pots for the kilograms): at most `limit`
 * pots, `spareKg` of load, and `left[j]` of class j. Lighter pots on the crowded first runs leave
 * the heavy ones for the later runs that carry the skipper alone.
 * @example takeLightest([{ massKg: 20, … }, { massKg: 30, … }], [1, 5], 4, 85) // [1, 2]
 */
export function takeLightest(classes: readonly PotClass[], left: readonly number[], limit: number, spareKg: number): number[] {
  let room = Math.max(0, Math.floor(limit));
  let kg = spareKg;
  return classes.map((cl, j) => {
    const byLoad = cl.massKg > 0 ? Math.floor(kg / cl.massKg + 1e-9) : room;
    const n = Math.max(0, Math.min(left[j] ?? 0, room, byLoad));
    room -= n;
    kg -= n * cl.massKg;
    return n;
  });
}

/** Kilograms of a run's pots given its pots per class (class masses, rounded up). */
export const mixKg = (classes: readonly PotClass[], mix: readonly number[] | undefined) =>
  (mix ?? []).reduce((kg, n, j) => kg + n * (classes[j]?.massKg ?? 0), 0);
