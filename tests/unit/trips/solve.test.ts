import { beforeAll, describe, expect, it } from 'vitest';
import { heuristicTripPlan, initTripSolver, solveTripPlan, validateTripPlan, type TripPlan } from '../../../server/domain/trips/index.js';
import { at, canoe, oneCanoe, person, skiffAndKayaks } from './fixtures.js';
import { T0 } from './instances.js';

const potsOf = (plan: TripPlan) => plan.runs.reduce((n, r) => n + r.pots, 0);
const manifest = (plan: TripPlan) => plan.runs.map((r) => `${r.craftId}#${r.run} ${r.people.join('+')} ${r.pots}`);

beforeAll(async () => {
  await initTripSolver();
});

describe('solveTripPlan on hand-worked instances', () => {
  it('one canoe, 6 pots, 2 people: 5 pots in two runs, the sixth cannot be planted in time', async () => {
    // Canoe: 1 km at 4 km/h = 15 min each way; cycle 15 + 5 + 15 + 10 = 45 min. Run k departs
    // 13:00 + 45(k − 1), lands 15 min later, is unloaded 5 min after that: runs unloaded at
    // 13:20, 14:05, 14:50 (a fourth would be 15:35, after the close).
    // One run: Ann + Bob = 150 kg, (280 − 150) / 25 = 5.2 → 5, but 4 slots → 4 pots.
    // Two runs: Ann paddles run 2 too and only plants from 14:05, so the one pair has
    // (15:00 − 14:05) / 10 = 5 planting slots → at most 5 pots. Three runs: the pair forms at
    // 14:50 → 1 slot. Best: 5 pots, last landing 14:00 (run 1 carries at most 4).
    // Balance: run 1 = 150 + 25a, run 2 = 70 + 25b (of 400 kg), a + b = 5, a, b ≤ 4:
    // (1, 4) gives 175 and 170 kg, peak 44 % — the lowest (2 + 3 peaks at 50 %).
    const plan = await solveTripPlan(oneCanoe());
    expect(plan).toMatchObject({ status: 'optimal', solver: 'highs', lastLandingAt: at('14:00') });
    expect(manifest(plan)).toEqual(['canoe-1#1 ann+bob 1', 'canoe-1#2 ann 4']);
    expect(plan.runs.map((r) => [r.departAt, r.landAt, r.returnAt])).toEqual([
      [at('13:00'), at('13:15'), at('13:35')],
      [at('13:45'), at('14:00'), at('15:15')],
    ]);
    expect(plan.runs[0]).toMatchObject({ loadKg: 175, loadShare: 0.4375 });
    expect(plan.unplaced).toMatchObject({ pots: 1, potReasons: [{ count: 1, reason: 'planting-time' }], people: [] });
  });

  it('a skiff with its operator and two kayaks: 14 pots landed by 13:45 in four runs', async () => {
    // Skiff: 10 min each way, cycle 35 min, lands 13:10, 13:45, 14:20, 14:55. Kayaks: 15 min
    // each way, cycle 45 min, land 13:15, 14:00, 14:45. Rooms: skiff run 1 with Olive + Cy
    // (160 kg) 6 pots (slots), later runs 6; a kayak with its 70-kg paddler (105 − 70) / 20 →
    // 1 pot. By 13:15 at most 6 + 1 + 1 = 8 land; the next landing, 13:45, adds the skiff's 6:
    // 14, all of them. Four runs, the fewest for that time. Everyone goes out: the skiff takes
    // three, so Pat and Paz paddle the kayaks. Putting Cy (not a paddler) in the skiff keeps its
    // peak at (160 + 120) / 400 = 70 %. Planting (5 min, two pairs) is not the limit.
    const plan = await solveTripPlan(skiffAndKayaks());
    expect(plan).toMatchObject({ status: 'optimal', solver: 'highs', lastLandingAt: at('13:45') });
    expect(manifest(plan)).toEqual(['skiff-1#1 olive+cy 6', 'kayak-1#1 pat 1', 'kayak-2#1 paz 1', 'skiff-1#2 olive 6']);
    expect(plan.unplaced).toEqual({ pots: 0, potReasons: [], people: [] });
  });

  it('a window too short for every pot: 4 land, 6 stay ashore for lack of time', async () => {
    // 13:00–14:00: the canoe's run 1 is unloaded at 13:20, run 2 would be at 14:05. Run 1 with
    // Ann and Bob carries 4 pots (slots); the other 6 cannot go.
    const instance = { ...oneCanoe(), window: { start: T0, end: at('14:00') }, pots: { count: 10, massKg: 25 } };
    const plan = await solveTripPlan(instance);
    expect(potsOf(plan)).toBe(4);
    expect(plan.unplaced.potReasons).toEqual([{ count: 6, reason: 'window-too-short', detail: expect.stringContaining('at most 4 pots'), refs: { at: instance.window.end } }]);
  });
});

describe('what cannot be planned', () => {
  it('an operator-required skiff with nobody holding the operator skill is infeasible', async () => {
    const instance = { ...skiffAndKayaks(), craft: skiffAndKayaks().craft.slice(0, 1), people: [person('cy'), person('pat', { skills: ['paddler'] })] };
    const plan = await solveTripPlan(instance);
    expect(plan.status).toBe('infeasible');
    expect(plan.runs).toEqual([]);
    expect(plan.idleCraft).toEqual([{ craftId: 'skiff-1', reason: 'no-operator', detail: expect.stringContaining('operator skill'), refs: { craftIds: ['skiff-1'] } }]);
    expect(plan.unplaced.people.map((p) => p.reason)).toEqual(['no-operator', 'no-operator']);
    expect(plan.unplaced.potReasons).toEqual([{ count: 14, reason: 'no-operator', detail: expect.any(String), refs: { craftIds: ['skiff-1'] } }]);
  });

  it('a window shorter than one leg is infeasible, with that reason', async () => {
    const instance = { ...oneCanoe(), window: { start: T0, end: at('13:19') } };
    const plan = await solveTripPlan(instance);
    expect(plan.status).toBe('infeasible');
    expect(plan.unplaced.people.map((p) => p.reason)).toEqual(['window-too-short', 'window-too-short']);
    expect(plan.unplaced.potReasons[0]).toMatchObject({ count: 6, reason: 'window-too-short' });
  });

  it('a tandem rated 250 kg takes at most 175 kg: the second 90-kg paddler stays ashore, over load', async () => {
    const instance = {
      ...oneCanoe(),
      plantingMinutesPerTree: 0,
      craft: [canoe({ id: 'tandem-1', kind: 'tandem-kayak' as const, maxLoadKg: 250, potSlots: 2 })],
      people: [person('pat', { skills: ['paddler'], weightKg: 90 }), person('pia', { skills: ['paddler'], weightKg: 90 })],
    };
    const plan = await solveTripPlan(instance);
    expect(plan.runs[0]).toMatchObject({ people: ['pat'], loadShare: expect.any(Number) });
    expect(plan.unplaced.people).toEqual([{ id: 'pia', reason: 'over-load', detail: expect.stringContaining('load margin') }]);
    for (const r of plan.runs) expect(r.loadKg).toBeLessThanOrEqual(175);
  });
});

describe('minors, owners and operators', () => {
  const base = () => ({ ...oneCanoe(), plantingMinutesPerTree: 0, craft: [canoe({ seats: 3 })] });

  it('a minor rides in the same craft and run as their guardian', async () => {
    const instance = { ...base(), people: [person('ann', { skills: ['paddler'] }), person('gus'), person('mo', { guardianId: 'gus', weightKg: 40 })] };
    const plan = await solveTripPlan(instance);
    expect(plan.runs[0]?.people).toEqual(expect.arrayContaining(['gus', 'mo']));
    expect(validateTripPlan(instance, plan)).toEqual([]);
  });

  it('a minor whose guardian is not on the crew stays ashore, and says why', async () => {
    const instance = { ...base(), people: [person('ann', { skills: ['paddler'] }), person('mo', { guardianId: 'gus', weightKg: 40 })] };
    const plan = await solveTripPlan(instance);
    expect(plan.unplaced.people).toEqual([{ id: 'mo', reason: 'guardian-not-aboard', detail: 'their guardian gus is not on the crew', refs: { personIds: ['gus'] } }]);
  });

  it("a volunteer's own kayak is paddled by its owner only, and stays ashore without them", async () => {
    const kayak = canoe({ id: 'olga-kayak', kind: 'sit-on-top-kayak' as const, seats: 1, maxLoadKg: 160, potSlots: 1, ownerId: 'olga' });
    const withOwner = { ...base(), craft: [kayak], people: [person('pat', { skills: ['paddler'] }), person('olga')] };
    const planned = await solveTripPlan(withOwner);
    expect(planned.runs.every((r) => r.people.join() === 'olga')).toBe(true);
    const without = { ...base(), craft: [kayak], people: [person('pat', { skills: ['paddler'] })] };
    const idle = await solveTripPlan(without);
    expect(idle).toMatchObject({ status: 'infeasible', idleCraft: [{ craftId: 'olga-kayak', reason: 'owner-absent' }] });
  });
});

describe('the MILP and the heuristic', () => {
  it.each([
    ['one canoe', oneCanoe()],
    ['skiff and kayaks', skiffAndKayaks()],
    ['short window', { ...oneCanoe(), window: { start: T0, end: at('14:00') } }],
  ])('agree on pots, people and last landing (%s); both plans are valid', async (_name, instance) => {
    const exact = await solveTripPlan(instance);
    const greedy = heuristicTripPlan(instance);
    const people = (p: TripPlan) => new Set(p.runs.flatMap((r) => r.people)).size;
    expect([potsOf(greedy), people(greedy), greedy.lastLandingAt]).toEqual([potsOf(exact), people(exact), exact.lastLandingAt]);
    expect(validateTripPlan(instance, exact)).toEqual([]);
    expect(validateTripPlan(instance, greedy)).toEqual([]);
    expect(greedy.solver).toBe('heuristic');
  });
});
