/** A coordinator's hand edit of a stored trip plan, written out once it passed every rule. */
import { instanceFromJson, potsAboard, runFromJson, standardWeight, type TripInstanceJson, type TripPlanJson, type TripRunJson } from '../domain/trips/index.js';

const sum = (xs: readonly number[]) => xs.reduce((n, x) => n + x, 0);

/**
 * The plan after a hand edit: runs as given, loads recomputed with each run's pots (as the
 * validator counted them: see `validate-pots.ts`), what stays ashore listed again.
 */
export function editedPlan(instance: TripInstanceJson, previous: TripPlanJson, runs: TripRunJson[]): TripPlanJson {
  const standard = standardWeight(instanceFromJson(instance));
  const weight = new Map(instance.people.map((p) => [p.id, p.weightKg ?? standard]));
  const craft = new Map(instance.craft.map((c) => [c.id, c]));
  const aboardPots = potsAboard(instanceFromJson(instance), runs.map(runFromJson));
  const listMasses = (instance.pots.masses ?? []).length > 0;
  const withLoads = runs.map((r, i) => {
    const potMassesKg = aboardPots[i] ?? [];
    const loadKg = sum(r.people.map((id) => weight.get(id) ?? 0)) + sum(potMassesKg);
    const { potMassesKg: _sent, ...rest } = r;
    return { ...rest, ...(listMasses ? { potMassesKg } : {}), loadKg, loadShare: loadKg / (craft.get(r.craftId)?.maxLoadKg ?? 1) };
  });
  const pots = sum(withLoads.map((r) => r.pots));
  const aboard = new Set(withLoads.flatMap((r) => r.people));
  const landings = withLoads.filter((r) => r.pots > 0).map((r) => Date.parse(r.landAt));
  const ashore = instance.pots.count - pots;
  return {
    ...previous,
    status: 'feasible',
    runs: withLoads,
    lastLandingAt: landings.length ? new Date(Math.max(...landings)).toISOString() : null,
    unplaced: {
      pots: ashore,
      potReasons: ashore > 0 ? [{ count: ashore, reason: 'left-ashore', detail: 'not placed on a run in the edited plan' }] : [],
      people: instance.people.filter((p) => !aboard.has(p.id)).map((p) => ({ id: p.id, reason: 'left-ashore', detail: 'not placed on a run in the edited plan' })),
    },
    idleCraft: instance.craft.filter((c) => !withLoads.some((r) => r.craftId === c.id)).map((c) => ({ craftId: c.id, reason: 'not-needed', detail: 'no run in the edited plan' })),
    gap: undefined,
    potsUpperBound: undefined,
    warnings: ['edited by hand and checked against every rule; not proven optimal'],
  };
}
