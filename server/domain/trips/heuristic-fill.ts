/**
 * The heuristic's pot fill for given crews and run counts: runs in order of unloading, each
 * taking the lightest pots left (`takeLightest`) up to its pot slots and load margin, and no more
 * than the crew at the site can still plant before the close (`planting.ts`).
 */
import { runTiming, type TripContext } from './context.js';
import { crewKg, draftArrivals, noPots, type Draft } from './draft.js';
import { takeLightest } from './pot-classes.js';
import { plantingSlots } from './planting.js';

interface Slot {
  c: number;
  k: number;
  readyAt: number;
  spareKg: number;
}

function slotsOf(ctx: TripContext, draft: Draft, runs: readonly number[]): Slot[] {
  const out: Slot[] = [];
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    if (!crew || !info) return;
    for (let k = 1; k <= (runs[c] ?? 0); k++) {
      out.push({ c, k, readyAt: runTiming(ctx, info, k, false).readyAt, spareKg: info.capKg - crewKg(ctx, crew, k) });
    }
  });
  return out.sort((a, b) => a.readyAt - b.readyAt || a.c - b.c || a.k - b.k);
}

/** Drops trailing empty runs; run 1 stays (it carries the crew). */
function runsUsed(row: readonly number[]): number {
  let n = row.length;
  while (n > 1 && (row[n - 1] ?? 0) === 0) n--;
  return Math.max(1, n);
}

/** Fills pots earliest first, with each craft allowed `runs[c]` runs (its skipper arriving after the last). */
export function fillPots(ctx: TripContext, draft: Draft, runs: readonly number[]): Draft {
  const length = (c: number) => Math.max(1, runs[c] ?? 1);
  const shaped: Draft = {
    crews: draft.crews,
    pots: draft.crews.map((crew, c) => (crew ? new Array<number>(length(c)).fill(0) : [])),
    mix: draft.crews.map((crew, c) => (crew ? Array.from({ length: length(c) }, () => noPots(ctx)) : [])),
  };
  const arrivals = draftArrivals(ctx, shaped);
  const slots = slotsOf(ctx, draft, runs);
  const times = [...new Set(slots.map((s) => s.readyAt))];
  const cap = times.map((t) => plantingSlots(ctx, arrivals, t));
  const queued = times.map(() => 0);
  const left = ctx.potClasses.map((cl) => cl.count);
  for (const s of slots) {
    let limit = ctx.crafts[s.c]?.craft.potSlots ?? 0;
    times.forEach((t, i) => {
      if (t <= s.readyAt) limit = Math.min(limit, (cap[i] ?? 0) - (queued[i] ?? 0));
    });
    const mix = takeLightest(ctx.potClasses, left, limit, s.spareKg);
    const add = mix.reduce((n, x) => n + x, 0);
    if (add <= 0) continue;
    times.forEach((t, i) => {
      if (t <= s.readyAt) queued[i] = (queued[i] ?? 0) + add;
    });
    mix.forEach((n, j) => (left[j] = (left[j] ?? 0) - n));
    const row = shaped.pots[s.c];
    const mixRow = shaped.mix[s.c];
    if (row) row[s.k - 1] = add;
    if (mixRow) mixRow[s.k - 1] = mix;
  }
  const used = shaped.pots.map(runsUsed);
  shaped.pots = shaped.pots.map((row, c) => (shaped.crews[c] ? row.slice(0, used[c]) : []));
  shaped.mix = shaped.mix.map((row, c) => (shaped.crews[c] ? row.slice(0, used[c]) : []));
  return shaped;
}
