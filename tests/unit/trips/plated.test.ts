import { beforeAll, describe, expect, it } from 'vitest';
import { initTripSolver, isPlated, marginFor, solveTripPlan, validateTripPlan, type TripCraft, type TripInstance } from '../../../server/domain/trips/index.js';
import { at, canoe, person } from './fixtures.js';
import { T0 } from './instances.js';

// Margins (TRADE.md §1): 70 % of a paddlecraft's rated load is common practice from paddling
// guidance (low-authority sources); a capacity plate is the legal limit, so 100 % of it.
beforeAll(async () => {
  await initTripSolver();
});

const skiff = (over: Partial<TripCraft> = {}): TripCraft => ({ id: 'skiff-1', kind: 'skiff', seats: 3, maxLoadKg: 400, potSlots: 10, speedKmh: 6, needsOperator: true, ...over });

/**
 * One craft, its skipper alone (80 kg), ten 40-kg pots, planting not limited. The skiff is 10 min
 * each way and unloads in 5 (ready 13:15); run 2 would be ready at 13:50, after the 13:40 close,
 * so the day is one run: the pots it takes are ⌊(margin × 400 − 80) / 40⌋ (10 slots).
 */
function oneRun(craft: TripCraft, skipper: 'operator' | 'paddler'): TripInstance {
  return {
    window: { start: T0, end: at('13:40') },
    route: { distanceKm: 1, loadMinutes: 10, unloadMinutes: 5 },
    plantingMinutesPerTree: 0,
    craft: [craft],
    people: [person('olive', { skills: [skipper] })],
    pots: { count: 10, massKg: 40 },
  };
}

describe('which margin a craft gets', () => {
  it.each([
    ['a skiff, plate not said', skiff(), true, 1],
    ['an operator-run canoe, plate not said', canoe({ needsOperator: true }), true, 1],
    ['a canoe, plate not said', canoe(), false, 0.7],
    ['a skiff with no capacity plate', skiff({ plated: false }), false, 0.7],
    ['a canoe that carries a capacity plate', canoe({ plated: true }), true, 1],
    ['a skiff, plate unknown (null)', skiff({ plated: null }), true, 1],
  ])('%s', (_name, craft, plated, margin) => {
    expect(isPlated(craft)).toBe(plated);
    expect(marginFor(craft)).toBe(margin);
  });

  it('uses the instance margins for each kind of rating', () => {
    expect(marginFor(skiff({ plated: false }), { paddlecraft: 0.6, plated: 0.9 })).toBe(0.6);
    expect(marginFor(canoe({ plated: true }), { paddlecraft: 0.6, plated: 0.9 })).toBe(0.9);
  });
});

describe('the plate decides what a run carries', () => {
  it('a plated skiff takes 8 pots: (400 − 80) / 40', async () => {
    const plan = await solveTripPlan(oneRun(skiff(), 'operator'));
    expect(plan.runs).toMatchObject([{ craftId: 'skiff-1', pots: 8, loadKg: 400, loadShare: 1 }]);
    expect(plan.unplaced.potReasons).toEqual([expect.objectContaining({ count: 2, reason: 'window-too-short' })]);
  });

  it('the same skiff without a plate takes 5: (0.7 × 400 − 80) / 40 = 5', async () => {
    const plan = await solveTripPlan(oneRun(skiff({ plated: false }), 'operator'));
    expect(plan.runs).toMatchObject([{ craftId: 'skiff-1', pots: 5, loadKg: 280, loadShare: 0.7 }]);
  });

  it('a canoe with a capacity plate takes 8 like the plated skiff', async () => {
    const plan = await solveTripPlan(oneRun(canoe({ plated: true, potSlots: 10, speedKmh: 6 }), 'paddler'));
    expect(plan.runs[0]).toMatchObject({ pots: 8, loadKg: 400 });
  });

  it('the validator holds an unplated skiff to 70 %', () => {
    const instance = oneRun(skiff({ plated: false }), 'operator');
    const runs = [{ craftId: 'skiff-1', run: 1, departAt: T0, landAt: at('13:10'), returnAt: at('13:50'), people: ['olive'], pots: 8, loadKg: 0, loadShare: 0 }];
    expect(validateTripPlan(instance, { runs }).map((v) => v.message)).toEqual(['skiff-1 run 1 loads 400 kg, over 70 % of its rated 400 kg (280 kg)']);
    expect(validateTripPlan(oneRun(skiff(), 'operator'), { runs })).toEqual([]);
  });
});
