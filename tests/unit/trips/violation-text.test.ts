import { describe, expect, it } from 'vitest';
import { validateTripPlan, violationText, type TripInstance, type TripRun, type TripViolation, type ViolationWords } from '../../../server/domain/trips/index.js';
import { at, skiffAndKayaks } from './fixtures.js';

// The plan of validate.test.ts (hand-worked, valid); each test breaks one rule of it.
const run = (craftId: string, n: number, people: string[], pots: number, depart: string, land: string, back: string): TripRun => ({
  craftId, run: n, people, pots, departAt: at(depart), landAt: at(land), returnAt: at(back), loadKg: 0, loadShare: 0,
});
const baseline = (): TripRun[] => [
  run('skiff-1', 1, ['olive', 'cy'], 6, '13:00', '13:10', '13:25'),
  run('kayak-1', 1, ['pat'], 1, '13:00', '13:15', '15:15'),
  run('kayak-2', 1, ['paz'], 1, '13:00', '13:15', '15:15'),
  run('skiff-1', 2, ['olive'], 6, '13:35', '13:45', '15:10'),
];

const PEOPLE: Record<string, string> = { olive: 'Olive Marsh', pat: 'Pat Reyes', paz: 'Paz Ortega', cy: 'Cy Lund' };
const CRAFT: Record<string, string> = { 'skiff-1': 'Ibis', 'kayak-1': 'Teal kayak', 'kayak-2': 'Blue kayak' };
const words = (over: Partial<ViolationWords> = {}): ViolationWords => ({
  personName: (id) => PEOPLE[id] ?? 'someone not on the crew',
  craftName: (id) => CRAFT[id] ?? 'a craft not in the fleet',
  units: 'ft',
  timeZone: 'America/New_York',
  ...over,
});

function broken(edit: (runs: TripRun[], instance: TripInstance) => void): TripViolation[] {
  const instance = skiffAndKayaks();
  const runs = baseline();
  edit(runs, instance);
  return validateTripPlan(instance, { runs });
}
const find = (runs: TripRun[], craftId: string, n: number) => runs.find((r) => r.craftId === craftId && r.run === n)!;

describe('violationText', () => {
  // Pat at 90 kg with a 20-kg pot (110 kg) in a kayak rated 150 kg, whose 70 % margin is 105 kg.
  // 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959):
  // 110 kg = 242.51 lb, 105 kg = 231.49 lb, 150 kg = 330.69 lb, shown to the whole pound.
  const overload = () => broken((_runs, i) => { i.people[1]!.weightKg = 90; });

  it('gives masses in pounds for an organisation that works in feet', () => {
    const [v] = overload();
    expect(v).toMatchObject({ rule: 'load', craftId: 'kayak-1', run: 1, facts: { loadKg: 110, limitKg: 105, ratedKg: 150 } });
    expect(violationText(v!, words())).toBe('Teal kayak run 1 would carry 243 lb, over its load margin of 231 lb (70 % of its rated 331 lb)');
  });

  it('gives masses in kilograms for an organisation that works in metres', () => {
    const [v] = overload();
    expect(violationText(v!, words({ units: 'm' }))).toBe('Teal kayak run 1 would carry 110 kg, over its load margin of 105 kg (70 % of its rated 150 kg)');
  });

  it('names craft and people instead of their ids', () => {
    const seats = broken((runs) => { find(runs, 'skiff-1', 1).people = ['olive', 'cy', 'pat', 'paz']; });
    const texts = seats.map((v) => violationText(v, words()));
    expect(texts).toContain('Ibis run 1 carries 4 people but has 3 seats');
    for (const t of texts) expect(t).not.toMatch(/skiff-1|kayak-\d|\bpat\b|\bpaz\b/);

    const [minor] = broken((_runs, i) => { i.people[3]!.guardianId = 'pat'; });
    expect(minor).toMatchObject({ rule: 'guardian', craftId: 'skiff-1', run: 1, personIds: ['cy', 'pat'] });
    expect(violationText(minor!, words())).toBe('Cy Lund is a minor on Ibis run 1 without their guardian Pat Reyes');

    const [operator] = broken((runs) => { find(runs, 'skiff-1', 2).people = ['cy']; });
    expect(violationText(operator!, words())).toBe('Ibis needs someone with the boat operator skill aboard every run; none is');
  });

  it('gives times on the clock of the organisation’s zone', () => {
    // 5 December 2026: New York keeps Eastern Standard Time, UTC−5, and Honolulu HST, UTC−10,
    // all year (IANA time zone database). 13:15 UTC = 8:15 AM EST = 3:15 AM HST.
    const planting = validateTripPlan({ ...skiffAndKayaks(), plantingMinutesPerTree: 60 }, { runs: baseline() });
    expect(violationText(planting[0]!, words())).toBe(
      '14 pots are unloaded from 8:15 AM EST on, but the crew at the site (0 pairs then) can plant only 2 of them by 10:00 AM EST',
    );
    const late = broken((runs) => {
      find(runs, 'kayak-1', 1).returnAt = at('13:35');
      runs.push(run('kayak-1', 2, ['pat'], 0, '13:45', '14:00', '14:20'), run('kayak-1', 3, ['pat'], 0, '14:30', '14:45', '15:05'));
      runs.push(run('kayak-1', 4, ['pat'], 0, '15:15', '15:30', '15:50'));
    });
    expect(late.map((v) => violationText(v, words({ timeZone: 'Pacific/Honolulu' })))).toEqual([
      'Teal kayak run 4 is unloaded at 5:35 AM HST, after the window closes at 5:00 AM HST',
    ]);
  });

  it('writes every rule without ids or UTC', () => {
    const all = [
      ...broken((runs) => { find(runs, 'skiff-1', 2).pots = 7; find(runs, 'kayak-1', 1).pots = 0; }),
      ...broken((_runs, i) => { i.craft[1]!.ownerId = 'paz'; }),
      ...broken((_runs, i) => { i.people[1]!.skills = []; }),
      ...broken((runs) => { find(runs, 'skiff-1', 2).people = ['olive', 'pat']; }),
      ...broken((runs) => { Object.assign(find(runs, 'skiff-1', 2), { departAt: at('13:30'), landAt: at('13:40') }); }),
      ...broken((runs) => { find(runs, 'kayak-2', 1).run = 2; }),
      ...broken((_runs, i) => { i.pots.count = 13; }),
    ];
    expect(new Set(all.map((v) => v.rule))).toEqual(new Set(['pot-slots', 'own-kayak', 'paddler', 'travels-once', 'timing', 'run-order', 'pots-total']));
    for (const v of all) expect(violationText(v, words())).not.toMatch(/UTC|skiff-1|kayak-\d|\b(olive|pat|paz|cy)\b/);
    expect(violationText(all.find((v) => v.rule === 'own-kayak')!, words())).toBe('Teal kayak is Paz Ortega’s own: only they may paddle it, aboard every run');
    expect(violationText(all.find((v) => v.rule === 'timing')!, words())).toBe('Ibis run 2 leaves at 8:30 AM EST, before run 1 is back and loaded (8:35 AM EST)');
  });
});
