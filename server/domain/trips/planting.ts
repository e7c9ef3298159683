/**
 * The planting deadline. Everyone who rode out plants, in pairs; a pair plants one tree per
 * `plantingMinutesPerTree`, one tree at a time, and must finish by `window.end`. Passengers are
 * at the site once their run is unloaded; a skipper once their craft's last run is unloaded
 * (before that they are shuttling). Pairs form in order of arrival: the i-th pair is there when
 * the (2i)-th person arrives.
 *
 * A pot unloaded at time r can be planted by any pair in a planting slot that starts at or after
 * both r and the pair's arrival. Packing each pair's trees against the close loses nothing, so
 * pair i has `floor((end − max(t, arrival_i)) / m)` slots from time t. Because the pots a later
 * time can use are a subset of those an earlier time can use, Hall's condition reduces to one
 * check per unloading time t: the pots unloaded at or after t must not outnumber the slots from
 * t. That is exact, and stricter than `floor(pairs × (end − t) / m)`, which would let two pairs
 * share one tree's work.
 */
import type { TripContext } from './context.js';

export interface PotDrop {
  readyAt: number;
  pots: number;
}

export interface PlantingShortfall {
  /** The unloading time checked. */
  readyAt: number;
  /** Pots unloaded at or after it. */
  pots: number;
  /** Planting slots from then until the close. */
  capacity: number;
  pairs: number;
}

/** Planting slots from time `from` until the close, for people arriving at `arrivals` (ms). */
export function plantingSlots(ctx: TripContext, arrivals: readonly number[], from: number): number {
  if (ctx.plantMs <= 0) return Number.MAX_SAFE_INTEGER;
  const sorted = [...arrivals].sort((a, b) => a - b);
  let slots = 0;
  for (let i = 1; i < sorted.length; i += 2) {
    const at = Math.max(from, sorted[i] ?? Infinity);
    if (at < ctx.end) slots += Math.floor((ctx.end - at) / ctx.plantMs + 1e-9);
  }
  return slots;
}

/** Pairs at the site at time t. */
export const pairsAt = (arrivals: readonly number[], t: number) => Math.floor(arrivals.filter((a) => a <= t).length / 2);

/** Every unloading time at which the pots unloaded from then on cannot all be planted in time. */
export function plantingShortfalls(ctx: TripContext, arrivals: readonly number[], drops: readonly PotDrop[]): PlantingShortfall[] {
  if (ctx.plantMs <= 0) return [];
  const times = [...new Set(drops.filter((d) => d.pots > 0).map((d) => d.readyAt))].sort((a, b) => a - b);
  const out: PlantingShortfall[] = [];
  for (const t of times) {
    const pots = drops.reduce((sum, d) => (d.readyAt >= t ? sum + d.pots : sum), 0);
    const capacity = plantingSlots(ctx, arrivals, t);
    if (pots > capacity) out.push({ readyAt: t, pots, capacity, pairs: pairsAt(arrivals, t) });
  }
  return out;
}
