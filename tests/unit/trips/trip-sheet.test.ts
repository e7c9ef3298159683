import { describe, expect, it } from 'vitest';
import { buildTripSheet } from '../../../server/domain/trips/trip-sheet.js';
import { distance, length, sheetClock, weight } from '../../../server/domain/trips/trip-sheet-format.js';
import { allText, plan, sectionLines, sheetInput } from './trip-sheet-fixture.js';

describe('trip sheet units and times', () => {
  // 1 lb = 0.45359237 kg exactly (international yard and pound agreement, 1959; NIST SP 811 B.8).
  it.each([
    [350, 'ft', '772 lb'], // 350 / 0.45359237 = 771.62
    [245, 'ft', '540 lb'], // 70 % of 350 kg = 245 kg = 540.13 lb
    [27, 'ft', '60 lb'], // 59.52 lb
    [350, 'm', '350 kg'],
  ] as const)('weight(%d kg, %s) is %s', (kg, units, text) => {
    expect(weight(kg, units)).toBe(text);
  });

  // 1 nmi = 1852 m exactly (International Hydrographic Conference 1929; BIPM SI Brochure table 8).
  it.each([
    [0.8, 'ft', '0.43 nmi'], // 800 / 1852 = 0.432
    [3.704, 'ft', '2.0 nmi'],
    [0.8, 'm', '0.80 km'],
    [12.25, 'm', '12.3 km'],
  ] as const)('distance(%d km, %s) is %s', (km, units, text) => {
    expect(distance(km, units)).toBe(text);
  });

  it('gives drafts in feet (1 ft = 0.3048 m exactly) or metres', () => {
    expect(length(0.15, 'ft')).toBe('0.5 ft'); // 0.492 ft
    expect(length(0.15, 'm')).toBe('0.15 m');
  });

  // US daylight time 2026: 8 March to 1 November (15 U.S.C. 260a); Queensland keeps UTC+10 all
  // year (IANA tz database), which en-US names by its offset.
  it.each([
    ['2026-04-10T13:00:00Z', 'America/New_York', 'EDT', '9:00 AM'],
    ['2026-01-10T14:00:00Z', 'America/New_York', 'EDT', '9:00 AM EST'],
    ['2026-04-10T13:00:00Z', 'Australia/Brisbane', 'GMT+10', '11:00 PM'],
  ])('clock for %s in %s on a %s sheet is %s', (iso, zone, sheetZone, text) => {
    expect(sheetClock(zone, sheetZone)(iso)).toBe(text);
  });
});

describe('buildTripSheet', () => {
  it('heads the sheet with the organisation, the workday and a dated file name on Letter paper', () => {
    const sheet = buildTripSheet(sheetInput());
    expect(sheet).toMatchObject({
      title: 'Trip sheet',
      organisation: 'Test Shoreline Trust',
      subtitle: 'Spring planting · Heron Point · Friday, April 10, 2026',
      fileName: 'trip-sheet-2026-04-10.pdf',
      paper: 'LETTER',
    });
  });

  it('states the day: window, launch, route distance, pots and the key times in the zone', () => {
    const day = sectionLines(buildTripSheet(sheetInput()), 'The day');
    expect(day).toEqual(expect.arrayContaining([
      'Site: Heron Point',
      'Launch: Mill Creek ramp',
      'Window: 9:00 AM – 12:00 PM EDT',
      'Route: launch to site 0.43 nmi each way; loading 10 min, unloading 5 min',
      'Pots: 8 × 60 lb each',
      'First departure: 9:00 AM EDT',
      'Last pot lands: 9:51 AM EDT',
      'Last craft back: 12:12 PM EDT',
      'Plan: proven optimal; built by the HiGHS solver',
    ]));
  });

  it('describes each craft going out and lists its runs with names, pots and load against the rated maximum', () => {
    const heron = sectionLines(buildTripSheet(sheetInput()), 'Heron');
    expect(heron).toEqual(expect.arrayContaining([
      'Kind: canoe, 2 seats',
      // 350 kg maker's rating; the 70 % paddlecraft margin (common practice, TRADE.md §1) is 245 kg.
      "Rated max. load: 772 lb (maker's rating); planned to at most 70% = 540 lb",
      'Pot slots: 6',
      'Operator: paddled by the crew',
      'Crossing: 12 min each way', // 0.8 km at 4 km/h
      'Notes: green hull',
      'Run | Departs (EDT) | Lands (EDT) | Back (EDT) | Aboard | Pots | Load (share of rated max.)',
      '1 | 9:00 AM | 9:12 AM | 9:29 AM | Ann Ortiz, Mia Ortiz | 2 | 392 lb, 51% of 772 lb', // 178 kg
      '2 | 9:39 AM | 9:51 AM | 12:12 PM | Ben Shaw | 4 | 423 lb, 55% of 772 lb', // 192 kg
    ]));
  });

  it("names a volunteer's own kayak by its owner", () => {
    const kayak = sectionLines(buildTripSheet(sheetInput()), "Kai Reyes's own sit-on-top kayak");
    expect(kayak).toContain('Owner: Kai Reyes (only the owner paddles it)');
    expect(kayak).toContain('1 | 9:00 AM | 9:12 AM | 12:12 PM | Kai Reyes | 1 | 245 lb, 69% of 353 lb'); // 111 kg of 160 kg
  });

  it('says what stays ashore and why, and which craft stays idle, with names and local times in the reasons', () => {
    const ashore = sectionLines(buildTripSheet(sheetInput()), 'Not placed');
    expect(ashore).toEqual([
      // 16:00 UTC = 12:00 PM EDT.
      '1 pot: Window too short. The runs that can be unloaded before the window closes at 12:00 PM EDT carry at most 7 pots.',
      'Zoe Park: No seat left. No craft going out has a seat left.',
      'Craft staying ashore:',
      'Pelican: No qualified operator. Pelican needs a qualified operator within its load margin; there is none on the crew.',
    ]);
  });

  it("reads the ids and the instant a reason lists in its refs, not guessed from the text", () => {
    const withRefs = plan();
    withRefs.unplaced.people = [{ id: 'zoe', reason: 'guardian-not-aboard', detail: 'their guardian ann is not going out', refs: { personIds: ['ann'] } }];
    // The planner clocks the close at 16:00 UTC; refs give the instant: 12:00 PM EDT (UTC−4).
    withRefs.unplaced.potReasons = [{ count: 1, reason: 'planting-time', detail: 'the crew cannot plant more before the window closes at 16:00 UTC', refs: { at: '2026-04-10T16:00:00.000Z' } }];
    withRefs.idleCraft = [{ craftId: 'pelican', reason: 'not-needed', detail: 'pelican is not needed', refs: { craftIds: ['pelican'] } }];
    const ashore = sectionLines(buildTripSheet(sheetInput({ plan: withRefs })), 'Not placed');
    expect(ashore).toEqual([
      '1 pot: Too late to plant before the window closes. The crew cannot plant more before the window closes at 12:00 PM EDT.',
      'Zoe Park: Guardian not aboard. Their guardian Ann Ortiz is not going out.',
      'Craft staying ashore:',
      'Pelican: Not needed. Pelican is not needed.',
    ]);
  });

  it('prints the usual cautions and defers to local rules and the operator', () => {
    const text = allText(buildTripSheet(sheetInput()));
    expect(text).toMatch(/wearable life jacket for everyone on the water/);
    expect(text).toMatch(/head for shore at the first thunder/);
    expect(text).toMatch(/Soft mud and oyster shell/);
    expect(text).toMatch(/Heat:/);
    expect(text).toContain("Local rules, permits and the licensed operator's judgement prevail over this plan.");
  });

  it('works in kilograms, kilometres and the zone of a metric organisation, on A4', () => {
    const sheet = buildTripSheet(sheetInput({ organisation: { name: 'Metric Trust', contactEmail: '', units: 'm', timeZone: 'Australia/Brisbane' } }));
    expect(sheet.paper).toBe('A4');
    expect(sheet.fileName).toBe('trip-sheet-2026-04-10.pdf');
    const text = allText(sheet);
    expect(text).toContain('Route: launch to site 0.80 km each way');
    expect(text).toContain('1 | 11:00 PM | 11:12 PM | 11:29 PM | Ann Ortiz, Mia Ortiz | 2 | 178 kg, 51% of 350 kg');
    expect(text).not.toMatch(/\blb\b|nmi/);
  });

  it('shows the spread of pot masses weighed one by one, and a hand-edited plan as such', () => {
    const input = sheetInput({ source: 'edited' });
    input.instance.pots = { count: 3, massKg: 27, masses: [31.75, 22.7] };
    const day = sectionLines(buildTripSheet(input), 'The day');
    expect(day).toContain('Pots: 3 pots, 50 lb to 70 lb each'); // 22.7 kg = 50.0 lb, 31.75 kg = 70.0 lb
    expect(day).toContain('Plan: proven optimal; edited by hand and checked against every rule');
  });

  it('still prints a craft that has left the fleet since, from the plan figures', () => {
    const input = sheetInput();
    input.craft = input.craft.filter((c) => c.id !== 'heron');
    const text = allText(buildTripSheet(input));
    expect(text).toContain('Craft no longer in the fleet');
    expect(text).toContain('1 | 9:00 AM | 9:12 AM | 9:29 AM | Ann Ortiz, Mia Ortiz | 2 | 392 lb, 51% of 772 lb');
  });

  it('says plainly when nothing is left ashore', () => {
    const clean = plan();
    clean.unplaced = { pots: 0, potReasons: [], people: [] };
    clean.idleCraft = [];
    expect(sectionLines(buildTripSheet(sheetInput({ plan: clean })), 'Not placed')).toEqual([
      'Every pot is placed on a run.',
      'Everyone going out is placed on a run.',
    ]);
  });
});
