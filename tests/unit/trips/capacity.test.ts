import { describe, expect, it } from 'vitest';
import {
  dayCapacity,
  instanceFromJson,
  personsFromManualWeightCapacity183_43,
  personsFromWeightCapacity183_41,
  planToJson,
  ruleOfThumbPersons,
  solveTripPlan,
} from '../../../server/domain/trips/index.js';
import { at, canoe, oneCanoe } from './fixtures.js';
import { T0 } from './instances.js';

describe('persons capacity suggestions (TRADE.md §1)', () => {
  // Rule of thumb, boat-ed.com study guide "Calculating your boat's capacity": L × B / 15, down.
  it.each([
    [16, 5, 5],
    [15, 4, 4],
    [12, 4.5, 3],
    [0, 5, 0],
  ])('rule of thumb: %s ft × %s ft → %i persons', (length, beam, persons) => {
    expect(ruleOfThumbPersons(length, beam)).toBe(persons);
  });

  // 33 CFR 183.41 (law.cornell.edu copy): (lb + 32) / 141, rounded half up: 550 lb → 4.13 → 4.
  it.each([
    [550, 4],
    [650, 5],
    [0, 0],
  ])('33 CFR 183.41: %i lb of persons capacity → %i persons', (lb, persons) => {
    expect(personsFromWeightCapacity183_41(lb)).toBe(persons);
  });

  it('33 CFR 183.43: a manual boat of 800 lb capacity → 720 lb → 5 persons', () => {
    expect(personsFromManualWeightCapacity183_43(800)).toBe(5);
  });
});

describe('dayCapacity', () => {
  const day = { window: { start: T0, end: at('14:00') }, route: { distanceKm: 1, loadMinutes: 10, unloadMinutes: 5 }, potMassKg: 25 };

  it('one canoe for an hour: 4 trees, one paddler and one planter', () => {
    // The canoe (15 min each way) is unloaded at 13:20; run 2 would be at 14:05. Paddler and
    // planter at the standard 84 kg leave 280 − 168 = 112 kg → 4 pots (also the 4 slots). Alone,
    // the paddler could carry 4 but not plant them: planting needs a pair. The pair has
    // (14:00 − 13:20) / 10 = 4 planting slots.
    const cap = dayCapacity({ ...day, craft: [canoe()], plantingMinutesPerTree: 10 });
    expect(cap).toEqual({
      trees: 4,
      transportPots: 4,
      plantingTrees: 4,
      roles: { 'own-kayak': 0, seat: 1, operator: 0, shore: 2, planter: 1 },
      craftUsed: ['canoe-1'],
      runs: 1,
      lastLandingAt: at('13:15'),
    });
  });

  it('asks for an operator per operator-required craft and the owner of each own kayak', () => {
    const skiff = { id: 'skiff-1', kind: 'skiff' as const, seats: 4, maxLoadKg: 600, potSlots: 8, speedKmh: 10, needsOperator: true };
    const own = canoe({ id: 'sot-9', kind: 'sit-on-top-kayak' as const, seats: 1, maxLoadKg: 160, potSlots: 1, ownerId: 'vol-9' });
    const cap = dayCapacity({ ...day, craft: [skiff, own], plantingMinutesPerTree: 5, treesAvailable: 20 });
    expect(cap.roles).toMatchObject({ operator: 1, 'own-kayak': 1, seat: 0, shore: 2 });
    expect(cap.trees).toBeLessThanOrEqual(20);
    expect(cap.trees).toBe(Math.min(cap.transportPots, cap.plantingTrees, 20));
  });
});

describe('ISO times at the API edge', () => {
  it('reads ISO windows and writes ISO run times', async () => {
    const { window: _w, ...rest } = oneCanoe();
    const instance = instanceFromJson({ ...rest, window: { start: '2026-12-05T13:00:00Z', end: '2026-12-05T15:00:00.000Z' } });
    expect(instance.window).toEqual({ start: at('13:00'), end: at('15:00') });
    const json = planToJson(await solveTripPlan(instance));
    expect(json.runs[0]).toMatchObject({ departAt: '2026-12-05T13:00:00.000Z', landAt: '2026-12-05T13:15:00.000Z' });
    expect(json.lastLandingAt).toBe('2026-12-05T14:00:00.000Z');
  });
});
