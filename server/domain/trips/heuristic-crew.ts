/**
 * Greedy crews for the heuristic: a skipper for every craft that can have one, then everyone
 * else as passengers on run 1 of the craft where they cost the fewest pots. Deterministic: ties
 * fall back to the order of the instance's lists.
 */
import { canSkipper, potRoom, runTiming, type CraftInfo, type PersonInfo, type TripContext } from './context.js';
import { crewKg, emptyDraft, noPots, type Draft } from './draft.js';

function minorsOf(ctx: TripContext): Map<string, PersonInfo[]> {
  const out = new Map<string, PersonInfo[]>();
  for (const p of ctx.people) {
    const g = p.person.guardianId;
    if (p.minor && g) out.set(g, [...(out.get(g) ?? []), p]);
  }
  return out;
}

/**
 * Which crafts get a skipper first. `owned-first`: owned crafts (their skipper is fixed), then
 * operator craft, then by pots per window; `seats-first`: the most seats first (a scarce paddler
 * is worth more in a canoe than alone in a kayak); `volume-first`: pots per window only.
 */
export type CraftOrder = 'owned-first' | 'seats-first' | 'volume-first';

function craftOrder(ctx: TripContext, order: CraftOrder): CraftInfo[] {
  const group = (c: CraftInfo) => (order !== 'owned-first' ? 0 : c.craft.ownerId ? 0 : c.craft.needsOperator ? 1 : 2);
  const seats = (c: CraftInfo) => (order === 'seats-first' ? c.craft.seats : 0);
  const volume = (c: CraftInfo) => potRoom(ctx, c, 0) * c.maxRuns;
  return ctx.crafts
    .filter((c) => c.maxRuns >= 1 && c.craft.seats >= 1 && c.capKg > 0)
    .sort((a, b) => group(a) - group(b) || seats(b) - seats(a) || volume(b) - volume(a) || b.craft.seats - a.craft.seats || a.index - b.index);
}

function pickSkipper(ctx: TripContext, c: CraftInfo, taken: Set<number>, minors: Map<string, PersonInfo[]>): PersonInfo | undefined {
  const fits = (p: PersonInfo) => (minors.get(p.person.id)?.length ?? 0) <= c.craft.seats - 1;
  const cost = (p: PersonInfo) => (minors.has(p.person.id) ? 4 : 0) + (p.operator ? 1 : 0) + (p.paddler ? 1 : 0);
  return ctx.people
    .filter((p) => !taken.has(p.index) && canSkipper(p, c) && fits(p))
    .sort((a, b) => cost(a) - cost(b) || a.weightKg - b.weightKg || a.index - b.index)[0];
}

/** Places a group (an adult and their minors) on the run 1 where it costs the fewest pots. */
function placeGroup(ctx: TripContext, draft: Draft, group: readonly PersonInfo[], only?: number): boolean {
  const groupKg = group.reduce((w, p) => w + p.weightKg, 0);
  let best: { c: number; loss: number; ready: number } | undefined;
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    if (!crew || !info || (only !== undefined && c !== only)) return;
    if (crew.passengers.length + 1 + group.length > info.craft.seats) return;
    const kgNow = crewKg(ctx, crew, 1);
    if (kgNow + groupKg > info.capKg + 1e-9) return;
    const loss = potRoom(ctx, info, kgNow) - potRoom(ctx, info, kgNow + groupKg);
    const ready = runTiming(ctx, info, 1, false).readyAt;
    if (!best || loss < best.loss || (loss === best.loss && ready < best.ready)) best = { c, loss, ready };
  });
  const crew = best ? draft.crews[best.c] : null;
  if (!crew) return false;
  crew.passengers.push(...group.map((p) => p.index));
  return true;
}

/**
 * Skippers first, then passenger groups: minors with a skippering guardian, then the rest,
 * biggest and heaviest groups first; a guardian whose minors find no seats beside them goes alone.
 */
export function assignCrews(ctx: TripContext, order: CraftOrder = 'owned-first'): Draft {
  const draft = emptyDraft(ctx);
  const minors = minorsOf(ctx);
  const taken = new Set<number>();
  for (const c of craftOrder(ctx, order)) {
    const skipper = pickSkipper(ctx, c, taken, minors);
    if (!skipper) continue;
    taken.add(skipper.index);
    draft.crews[c.index] = { skipper: skipper.index, passengers: [] };
    draft.pots[c.index] = [0];
    draft.mix[c.index] = [noPots(ctx)];
    const kids = minors.get(skipper.person.id) ?? [];
    if (placeGroup(ctx, draft, kids, c.index)) kids.forEach((k) => taken.add(k.index));
  }
  const groups = ctx.people
    .filter((p) => !p.minor && !taken.has(p.index))
    .map((p) => [p, ...(minors.get(p.person.id) ?? []).filter((k) => !taken.has(k.index))]);
  const groupKg = (g: readonly PersonInfo[]) => g.reduce((w, p) => w + p.weightKg, 0);
  groups.sort((a, b) => b.length - a.length || groupKg(b) - groupKg(a) || (a[0]?.index ?? 0) - (b[0]?.index ?? 0));
  for (const g of groups) {
    const lead = g[0];
    if (!placeGroup(ctx, draft, g) && g.length > 1 && lead) placeGroup(ctx, draft, [lead]);
  }
  return draft;
}
