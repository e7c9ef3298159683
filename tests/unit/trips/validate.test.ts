import { describe, expect, it } from 'vitest';
import { validateTripPlan, type TripInstance, type TripRun } from '../../../server/domain/trips/index.js';
import { at, person, skiffAndKayaks } from './fixtures.js';

// Rules are Ebbroot's own (DESIGN.md "Trip plan", issue 6); each case breaks exactly one.
// Baseline: the hand-worked optimal plan of `skiffAndKayaks` (see solve.test.ts). The skiff is
// 10 min each way, the kayaks 15; unloading 5 min, loading 10; the last run of each craft waits
// at the site and is back at 15:00 + one leg.
const run = (craftId: string, n: number, people: string[], pots: number, depart: string, land: string, back: string, loadKg = 0): TripRun => ({
  craftId, run: n, people, pots, departAt: at(depart), landAt: at(land), returnAt: at(back), loadKg, loadShare: 0,
});

const baseline = (): TripRun[] => [
  run('skiff-1', 1, ['olive', 'cy'], 6, '13:00', '13:10', '13:25'),
  run('kayak-1', 1, ['pat'], 1, '13:00', '13:15', '15:15'),
  run('kayak-2', 1, ['paz'], 1, '13:00', '13:15', '15:15'),
  run('skiff-1', 2, ['olive'], 6, '13:35', '13:45', '15:10'),
];

type Edit = (runs: TripRun[], instance: TripInstance) => void;
const find = (runs: TripRun[], craftId: string, n: number) => runs.find((r) => r.craftId === craftId && r.run === n)!;

const cases: [string, Edit, string[]][] = [
  ['a run over its pot slots', (runs) => { find(runs, 'skiff-1', 2).pots = 7; find(runs, 'kayak-1', 1).pots = 0; }, ['pot-slots']],
  ['a kayak over its 70 % margin', (_runs, i) => { i.people[1]!.weightKg = 90; }, ['load']],
  ['a skiff run without its operator', (runs) => { find(runs, 'skiff-1', 2).people = ['cy']; }, ['operator']],
  ["someone else's own kayak", (_runs, i) => { i.craft[1]!.ownerId = 'paz'; }, ['own-kayak']],
  ['a kayak with no paddler aboard', (_runs, i) => { i.people[1]!.skills = []; }, ['paddler']],
  ['a person riding out in two craft', (runs) => { find(runs, 'skiff-1', 2).people = ['olive', 'pat']; }, ['travels-once']],
  ['a minor without their guardian', (_runs, i) => { i.people[3]!.guardianId = 'pat'; }, ['guardian']],
  ['more people to bring back than seats', (runs, i) => {
    i.people = [...i.people, person('dee'), person('eve')];
    find(runs, 'skiff-1', 1).people.push('eve');
    find(runs, 'skiff-1', 2).people.push('dee');
  }, ['return']],
  ['a run unloaded after the window closes', (runs) => {
    find(runs, 'kayak-1', 1).returnAt = at('13:35');
    runs.push(run('kayak-1', 2, ['pat'], 0, '13:45', '14:00', '14:20'), run('kayak-1', 3, ['pat'], 0, '14:30', '14:45', '15:05'));
    runs.push(run('kayak-1', 4, ['pat'], 0, '15:15', '15:30', '15:50'));
  }, ['window']],
  ['a departure before the craft is back and loaded', (runs) => {
    Object.assign(find(runs, 'skiff-1', 2), { departAt: at('13:30'), landAt: at('13:40') });
  }, ['timing']],
  ['runs not numbered from 1', (runs) => { find(runs, 'kayak-2', 1).run = 2; }, ['run-order']],
  ['a craft not in the fleet', (runs) => { find(runs, 'kayak-2', 1).craftId = 'raft-9'; }, ['unknown-craft']],
  ['a person not on the crew', (runs) => { find(runs, 'skiff-1', 1).people.push('zed'); }, ['unknown-person']],
  ['more pots than are ready', (_runs, i) => { i.pots.count = 13; }, ['pots-total']],
];

describe('validateTripPlan', () => {
  it('accepts the hand-worked plan', () => {
    expect(validateTripPlan(skiffAndKayaks(), { runs: baseline() })).toEqual([]);
  });

  it.each(cases)('reports %s', (_name, edit, rules) => {
    const instance = skiffAndKayaks();
    const runs = baseline();
    edit(runs, instance);
    expect(validateTripPlan(instance, { runs }).map((v) => v.rule)).toEqual(rules);
  });

  it('says precisely what is wrong', () => {
    const instance = skiffAndKayaks();
    const runs = baseline();
    find(runs, 'skiff-1', 2).pots = 7;
    find(runs, 'skiff-1', 2).people = ['cy'];
    instance.people[1]!.weightKg = 90;
    expect(validateTripPlan(instance, { runs }).map((v) => v.message)).toEqual([
      'kayak-1 run 1 loads 110 kg, over 70 % of its rated 150 kg (105 kg)',
      'skiff-1 run 2 carries 7 pots but has 6 pot slots',
      'skiff-1 needs someone with the operator skill aboard every run; none is',
      'the runs carry 15 pots but only 14 are ready',
    ]);
  });

  it('reports pots the crew cannot plant before the close', () => {
    // 60 min per tree per pair: Cy is at the site from 13:15, Pat and Paz from 13:20, Olive
    // from 13:50. From 13:15 on, pair 1 (13:20) has (15:00 − 13:20) / 60 → 1 slot and pair 2
    // (13:50) 1 slot: 2 slots for 14 pots.
    const instance = { ...skiffAndKayaks(), plantingMinutesPerTree: 60 };
    const violations = validateTripPlan(instance, { runs: baseline() });
    expect(violations[0]).toEqual({
      rule: 'planting-time',
      facts: { count: 14, limit: 2, pairs: 0, at: at('13:15'), by: at('15:00') },
      message: '14 pots are unloaded from 13:15 UTC on, but the crew at the site (0 pairs then) can plant only 2 of them by 15:00 UTC',
    });
    expect(violations.every((v) => v.rule === 'planting-time')).toBe(true);
  });
});
