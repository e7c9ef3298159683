import { describe, expect, it } from 'vitest';
import { craftMargin, humanize, loadState, placeRefusal, planStatus, tripLanes, tripNames } from '@/utils/trip-board';
import { ASHORE, applyEdit, describeEdit, movePlaces, toRunInputs } from '@/utils/trip-edits';
import { formatLoad, formatRating, formatShare, formatSpeed, knots } from '@/utils/trip-format';
import { buildTripTimeline } from '@/utils/trip-timeline';
import { IDS, buildStoredPlan, fleet, roster } from './trip-board-data';

const stored = buildStoredPlan();
const names = tripNames(stored.instance, roster, fleet);
const runs = stored.plan.runs;
const skiff1 = `${IDS.skiff}#1`;
const canoe1 = `${IDS.canoe}#1`;

describe('trip formats', () => {
  // 1 lb = 0.45359237 kg exactly (international avoirdupois pound, NIST Handbook 44 Appendix C):
  // 408.2 kg = 899.9 lb, 300 kg = 661.4 lb, 158.8 kg = 350.1 lb.
  it.each([
    [408.2, 'ft', '408 kg (900 lb)'],
    [158.8, 'ft', '159 kg (350 lb)'],
    [158.8, 'm', '159 kg'],
  ] as const)('formatRating(%s, %s) is "%s"', (kg, units, text) => {
    expect(formatRating(kg, units)).toBe(text);
  });

  it('shows board loads in the organisation’s unit only', () => {
    expect(formatLoad(300, 'ft')).toBe('661 lb');
    expect(formatLoad(300, 'm')).toBe('300 kg');
  });

  it('never rounds a load over the rating down to 100 %', () => {
    expect(formatShare(0.7354)).toBe('74 %');
    expect(formatShare(1)).toBe('100 %');
    expect(formatShare(1.004)).toBe('101 %');
  });

  // The knot is one international nautical mile (1852 m, exact) per hour (BIPM SI Brochure, 9th ed., Table 8).
  it('gives speeds in km/h and knots', () => {
    expect(knots(7.408)).toBeCloseTo(4, 12);
    expect(formatSpeed(4)).toBe('4 km/h (2.2 kn)');
  });
});

describe('load margins and states', () => {
  // Common practice: paddlers keep loads to about 70 % of a maker's rating; a capacity plate is
  // planned to 100 % (TRADE.md §1). The plan never goes above the rating.
  it.each([
    [{ kind: 'canoe', needsOperator: false }, undefined, 0.7],
    [{ kind: 'skiff', needsOperator: false }, undefined, 1],
    [{ kind: 'other', needsOperator: true }, undefined, 1],
    [{ kind: 'skiff', needsOperator: false, plated: false }, undefined, 0.7],
    [{ kind: 'canoe', needsOperator: false }, { paddlecraft: 0.6, plated: 1.2 }, 0.6],
    [{ kind: 'skiff', needsOperator: false }, { paddlecraft: 0.6, plated: 1.2 }, 1],
  ] as const)('craftMargin(%j, %j) is %s', (craft, margin, expected) => {
    expect(craftMargin(craft, margin)).toBe(expected);
  });

  it.each([
    [0.69, 0.7, 'within'],
    [0.7, 0.7, 'within'],
    [0.71, 0.7, 'above-margin'],
    [1, 1, 'within'],
    [1.01, 1, 'above-rating'],
    [1.01, 0.7, 'above-rating'],
  ] as const)('a share of %s against a margin of %s is %s', (share, margin, state) => {
    expect(loadState(share, margin)).toBe(state);
  });
});

describe('names and messages', () => {
  it('names an own kayak after its owner and puts names for ids in messages', () => {
    const own = { ...stored.instance, craft: [...stored.instance.craft, { id: `own-${IDS.ben}`, kind: 'sit-on-top-kayak' as const, seats: 1, maxLoadKg: 147, potSlots: 1, speedKmh: 4, needsOperator: false, ownerId: IDS.ben }] };
    const withOwn = tripNames(own, roster, fleet);
    expect(withOwn.craft.get(`own-${IDS.ben}`)).toBe('Ben Okoro’s own sit-on-top kayak');
    expect(humanize(`own-${IDS.ben} belongs to ${IDS.ben}: only ${IDS.ben} may paddle it`, withOwn)).toBe('Ben Okoro’s own sit-on-top kayak belongs to Ben Okoro: only Ben Okoro may paddle it');
  });

  it('places each reason of a refused edit by the body path the server files it under', () => {
    // The runs as sent, with a run 10 to tell it from run 1.
    const sent = [...runs, { ...runs[0]!, run: 10 }];
    const last = sent.length - 1;
    const placed = placeRefusal(
      {
        runs: ['Skimmer run 10 carries 6 people but has 5 seats', 'Skimmer needs someone with the boat operator skill aboard every run; none is', 'The runs carry 19 pots but only 18 are ready'],
        [`runs.${last}`]: ['Skimmer run 10 carries 6 people but has 5 seats'],
        'runs.0.craftId': ['Skimmer needs someone with the boat operator skill aboard every run; none is'],
        _: ['The runs carry 19 pots but only 18 are ready'],
        'runs.99': ['A run the client did not send'],
      },
      sent,
    );
    expect(placed).toEqual([
      { text: 'Skimmer run 10 carries 6 people but has 5 seats', runKey: `${IDS.skiff}#10`, craftId: IDS.skiff },
      { text: 'Skimmer needs someone with the boat operator skill aboard every run; none is', craftId: sent[0]!.craftId },
      { text: 'The runs carry 19 pots but only 18 are ready' },
      { text: 'A run the client did not send' },
    ]);
  });

  it('falls back to the plain list when the server files nothing by path', () => {
    expect(placeRefusal({ runs: ['Something is wrong'] }, runs)).toEqual([{ text: 'Something is wrong' }]);
  });

  it('orders lanes by first departure and keeps idle craft last with their reason', () => {
    expect(tripLanes(stored, names).map((l) => [l.name, l.runs.map((r) => r.run), l.margin, l.idle])).toEqual([
      ['Skimmer', [1, 2], 1, null],
      ['Tarpon', [1], 0.7, null],
      ['Ibis', [], 0.7, 'Ibis needs an adult with the paddler skill; there is none on the crew'],
    ]);
  });

  it('states the plan in plain words, never as safe', () => {
    const all = [planStatus(stored.plan, 'solver'), planStatus({ ...stored.plan, status: 'feasible' }, 'solver'), planStatus(stored.plan, 'edited'), planStatus({ ...stored.plan, status: 'infeasible' }, 'solver')];
    expect(all.map((s) => s.label)).toEqual(['Proven best', 'Workable', 'Edited by hand', 'Nothing fits']);
    for (const s of all) expect(`${s.label} ${s.text}`).not.toMatch(/\bsafe/i);
  });
});

describe('hand edits', () => {
  it('moves a person between runs, ashore and back, and refuses moves that change nothing', () => {
    const moved = applyEdit(runs, { kind: 'person', personId: IDS.cleo, from: skiff1, to: canoe1 });
    expect(moved?.map((r) => r.people)).toEqual([[IDS.ana], [IDS.ben, IDS.dev, IDS.eli, IDS.cleo], [IDS.ana]]);
    expect(applyEdit(runs, { kind: 'person', personId: IDS.cleo, from: skiff1, to: ASHORE })?.[0]?.people).toEqual([IDS.ana]);
    expect(applyEdit(runs, { kind: 'person', personId: 'zed', from: ASHORE, to: canoe1 })?.[1]?.people).toContain('zed');
    expect(applyEdit(runs, { kind: 'person', personId: IDS.cleo, from: canoe1, to: skiff1 })).toBeNull();
    expect(applyEdit(runs, { kind: 'person', personId: IDS.ana, from: skiff1, to: `${IDS.skiff}#2` })).toBeNull();
    expect(applyEdit(runs, { kind: 'person', personId: IDS.cleo, from: skiff1, to: skiff1 })).toBeNull();
    expect(applyEdit(runs, { kind: 'person', personId: IDS.cleo, from: skiff1, to: 'nowhere#1' })).toBeNull();
  });

  it('moves one pot at a time and sets a run’s pots', () => {
    expect(applyEdit(runs, { kind: 'pot', from: skiff1, to: canoe1 })?.map((r) => r.pots)).toEqual([7, 2, 8]);
    expect(applyEdit(runs, { kind: 'pot', from: canoe1, to: ASHORE })?.map((r) => r.pots)).toEqual([8, 0, 8]);
    expect(applyEdit(runs, { kind: 'pot', from: ASHORE, to: canoe1 })?.map((r) => r.pots)).toEqual([8, 2, 8]);
    const empty = applyEdit(runs, { kind: 'pots', key: canoe1, pots: 0 }) ?? [];
    expect(applyEdit(empty, { kind: 'pot', from: canoe1, to: skiff1 })).toBeNull();
    expect(applyEdit(runs, { kind: 'pots', key: canoe1, pots: 1 })).toBeNull();
    expect(applyEdit(runs, { kind: 'pots', key: canoe1, pots: -1 })).toBeNull();
  });

  it('says an edit in words and sends runs without the loads, which the server recomputes', () => {
    expect(describeEdit({ kind: 'person', personId: IDS.eli, from: canoe1, to: ASHORE }, names)).toBe('moving Eli Patel from Tarpon run 1 to ashore');
    expect(describeEdit({ kind: 'pots', key: canoe1, pots: 2 }, names)).toBe('setting Tarpon run 1 to 2 pots');
    expect(toRunInputs(runs)[0]).toEqual({ craftId: IDS.skiff, run: 1, departAt: '2025-03-15T12:00:00.000Z', landAt: '2025-03-15T12:07:00.000Z', returnAt: '2025-03-15T12:19:00.000Z', people: [IDS.ana, IDS.cleo], pots: 8 });
    expect(movePlaces(tripLanes(stored, names), 'America/New_York').map((p) => p.label)).toEqual([
      'Skimmer run 1 (leaves 08:00)', 'Skimmer run 2 (leaves 08:29)', 'Tarpon run 1 (leaves 08:00)', 'Ashore (on no run)',
    ]);
  });
});

describe('buildTripTimeline', () => {
  // Span: 30 min before the window opens (11:30Z) to 30 min after the last return (15:21Z + 30 = 15:51Z),
  // 261 minutes. The window (12:00–15:00Z) is at 30/261 = 11.49 % to 210/261 = 80.46 %; Tarpon
  // leaves at 11.49 %, lands at 12:21Z = 51/261 = 19.54 % and is back at 15:21Z = 231/261 = 88.51 %.
  it('places the window, its close, the last landing and every run on one scale', () => {
    const t = buildTripTimeline({ window: stored.instance.window, runs, lanes: [{ id: IDS.canoe, name: 'Tarpon' }], levels: [], timeZone: 'America/New_York', lastLandingAt: stored.plan.lastLandingAt });
    expect(t.window).toEqual({ from: 11.49, to: 80.46 });
    expect(t.closeLabel).toBe('11:00');
    // Last landing 12:36Z = 66/261 = 25.29 %.
    expect(t.lastLanding).toEqual({ at: 25.29, label: '08:36' });
    expect(t.rows).toEqual([{ craftId: IDS.canoe, name: 'Tarpon', bars: [{ key: canoe1, run: 1, depart: 11.49, land: 19.54, back: 88.51, label: 'Tarpon run 1: leaves 08:00, lands 08:21, back 11:21' }] }]);
    // Whole hours of the site's clock (EDT): 08:00 is 12:00Z, … 11:00 is 15:00Z.
    expect(t.ticks).toEqual([{ at: 11.49, label: '08:00' }, { at: 34.48, label: '09:00' }, { at: 57.47, label: '10:00' }, { at: 80.46, label: '11:00' }]);
    expect(t.path).toBe('');
  });

  it('draws the tide past the edges rather than bending it there', () => {
    const levels = [0, 60, 120, 180, 240, 300].map((m, i) => ({ time: new Date(Date.parse('2025-03-15T11:00:00.000Z') + m * 60_000).toISOString(), height: i }));
    const t = buildTripTimeline({ window: stored.instance.window, runs, lanes: [], levels, timeZone: 'America/New_York', lastLandingAt: null });
    // 11:00Z is 30 min before the span starts: x = −30/261 = −11.49; heights 0…5 fill 4–36 of the 40-unit box.
    expect(t.path.startsWith('M-11.49 36 L11.49 29.6')).toBe(true);
  });
});
