/** Between drafts and MILP vectors: the heuristic's draft as a warm start, and a solution back to a draft. */
import { runTiming, type TripContext } from './context.js';
import { draftRuns, emptyDraft, shareSteps, type Draft } from './draft.js';
import { key, type MilpIndex } from './milp-index.js';
import { symmetryGroups } from './milp-model.js';

/** The draft with identical crafts swapped so that they make runs in non-increasing numbers, as the model orders them. */
function canonical(ctx: TripContext, ix: MilpIndex, draft: Draft): Draft {
  const out: Draft = { crews: [...draft.crews], pots: [...draft.pots], mix: [...draft.mix] };
  for (const group of symmetryGroups(ctx, ix)) {
    const runs = (c: number) => (draft.crews[c] ? (draft.pots[c]?.length ?? 0) : 0);
    const order = [...group].sort((a, b) => runs(b) - runs(a) || a - b);
    group.forEach((c, i) => {
      const from = order[i] ?? c;
      out.crews[c] = draft.crews[from] ?? null;
      out.pots[c] = draft.pots[from] ?? [];
      out.mix[c] = draft.mix[from] ?? [];
    });
  }
  return out;
}

function setAll(v: number[], ix: MilpIndex, ctx: TripContext, draft: Draft): boolean {
  let ok = true;
  const set = (col: number | undefined, value: number) => (col === undefined ? (ok = ok && value === 0) : (v[col] = value));
  draft.crews.forEach((crew, c) => {
    if (!crew) return;
    set(ix.s.get(key(ix.classOf[crew.skipper] ?? -1, c)), 1);
    const counts = new Map<number, number>();
    for (const p of crew.passengers) counts.set(ix.classOf[p] ?? -1, (counts.get(ix.classOf[p] ?? -1) ?? 0) + 1);
    for (const [q, n] of counts) set(ix.x.get(key(q, c)), n);
    const pots = draft.pots[c] ?? [];
    const u = ix.u.get(c);
    if (!u || pots.length > u.length) ok = false;
    pots.forEach((_, k) => {
      set(u?.[k], 1);
      const cols = ix.n.get(c)?.[k];
      (draft.mix[c]?.[k] ?? []).forEach((n, j) => set(cols?.[j], n));
    });
  });
  return ok;
}

function setPlanting(v: number[], ix: MilpIndex, ctx: TripContext, draft: Draft): void {
  const present = ix.times.map(() => 0);
  const dropped = ix.times.map(() => 0);
  const at = (t: number) => ix.times.indexOf(t);
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    if (!crew || !info) return;
    const pots = draft.pots[c] ?? [];
    const first = at(runTiming(ctx, info, 1, false).readyAt);
    const last = at(runTiming(ctx, info, Math.max(1, pots.length), false).readyAt);
    present[first] = (present[first] ?? 0) + crew.passengers.length;
    present[last] = (present[last] ?? 0) + 1;
    pots.forEach((n, k) => {
      const i = at(runTiming(ctx, info, k + 1, false).readyAt);
      dropped[i] = (dropped[i] ?? 0) + n;
    });
  });
  const slotsFrom = (t: number) => Math.floor((ctx.end - t) / ctx.plantMs + 1e-9);
  let people = 0;
  const pairs: number[] = [];
  ix.times.forEach((_, i) => {
    people += present[i] ?? 0;
    pairs.push(Math.floor(people / 2));
    v[ix.A[i] ?? -1] = people;
    v[ix.pi[i] ?? -1] = pairs[i] ?? 0;
  });
  let running = 0;
  for (let i = ix.times.length - 1; i >= 0; i--) {
    const t = ix.times[i] ?? 0;
    const next = ix.times[i + 1];
    running += (dropped[i] ?? 0) - (pairs[i] ?? 0) * (slotsFrom(t) - (next === undefined ? 0 : slotsFrom(next)));
    v[ix.G[i] ?? -1] = running;
  }
}

/** The draft as a full column vector, or null when the model cannot express it. */
export function startVector(ctx: TripContext, ix: MilpIndex, numCols: number, given: Draft): number[] | null {
  const draft = canonical(ctx, ix, given);
  const v = new Array<number>(numCols).fill(0);
  if (!setAll(v, ix, ctx, draft)) return null;
  if (ctx.plantMs > 0) setPlanting(v, ix, ctx, draft);
  const runs = draftRuns(ctx, draft);
  const ranks = runs.filter((r) => r.pots > 0 || r.run > 1).map((r) => ix.landRank.get(r.landAt) ?? 0);
  const last = ranks.length ? Math.max(...ranks) : 0;
  ix.z.forEach((z, r) => {
    if (z >= 0) v[z] = r <= last ? 1 : 0;
  });
  v[ix.M] = shareSteps(runs.reduce((m, r) => Math.max(m, r.loadShare), 0));
  return v;
}

/** A MILP solution vector as a draft (integers rounded; people taken from their classes in order). */
export function decode(ctx: TripContext, ix: MilpIndex, value: ArrayLike<number>): Draft {
  const draft = emptyDraft(ctx);
  const next = ix.classes.map(() => 0);
  const take = (q: number) => ix.classes[q]?.members[next[q]++] ?? -1;
  const get = (col: number | undefined) => (col === undefined ? 0 : Math.round(value[col] ?? 0));
  for (const c of ix.crafts) {
    if (get(ix.u.get(c)?.[0]) !== 1) continue;
    const q = ix.classes.findIndex((_, i) => get(ix.s.get(key(i, c))) === 1);
    draft.crews[c] = { skipper: take(q), passengers: [] };
    const runs = (ix.u.get(c) ?? []).filter((col) => get(col) === 1).length;
    draft.mix[c] = (ix.n.get(c) ?? []).slice(0, Math.max(1, runs)).map((cols) => ctx.potClasses.map((_, j) => get(cols[j])));
    draft.pots[c] = (draft.mix[c] ?? []).map((mix) => mix.reduce((n, x) => n + x, 0));
  }
  for (const c of ix.crafts) {
    const crew = draft.crews[c];
    if (!crew) continue;
    ix.classes.forEach((_, q) => {
      for (let i = get(ix.x.get(key(q, c))); i > 0; i--) crew.passengers.push(take(q));
    });
  }
  return draft;
}
