/**
 * A small stored plan for the trip sheet and float plan tests (invented people and craft).
 *
 * Window 13:00–16:00 UTC on 10 April 2026 = 9:00 AM–12:00 PM EDT (US daylight time began on
 * 8 March 2026, the second Sunday of March, 15 U.S.C. 260a; EDT is UTC−4). Route 0.8 km at
 * 4 km/h: 12 min each way. Canoe "Heron": run 1 departs 13:00, lands 13:12, unloads 5 min,
 * back 13:29; loads 10 min, run 2 departs 13:39, lands 13:51, waits for the window to close and
 * is back at 16:12. Ann (standard 84 kg) + Mia (40 kg) + 2 pots × 27 kg = 178 kg = 51 % of
 * 350 kg; Ben 84 kg + 4 × 27 kg = 192 kg = 55 %. Kai's own kayak: 84 + 27 = 111 kg of 160 = 69 %.
 */
import type { TripInstanceJson, TripPlanJson } from '../../../server/domain/trips/index.js';
import type { PrintableSheet, SheetBlock, TripSheetInput } from '../../../server/domain/trips/trip-sheet-types.js';

export const instance = (): TripInstanceJson => ({
  window: { start: '2026-04-10T13:00:00.000Z', end: '2026-04-10T16:00:00.000Z' },
  route: { distanceKm: 0.8, loadMinutes: 10, unloadMinutes: 5 },
  plantingMinutesPerTree: 20,
  craft: [
    { id: 'heron', kind: 'canoe', seats: 2, maxLoadKg: 350, potSlots: 6, speedKmh: 4, needsOperator: false },
    { id: 'own-kai', kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 160, potSlots: 1, speedKmh: 4, needsOperator: false, ownerId: 'kai' },
    { id: 'pelican', kind: 'skiff', seats: 4, maxLoadKg: 450, potSlots: 10, speedKmh: 10, needsOperator: true },
  ],
  people: [
    { id: 'ann', skills: ['paddler'] },
    { id: 'mia', weightKg: 40, skills: [], guardianId: 'ann' },
    { id: 'ben', skills: ['paddler'] },
    { id: 'kai', skills: ['paddler'] },
    { id: 'zoe', skills: [] },
  ],
  pots: { count: 8, massKg: 27 },
});

const run = (craftId: string, n: number, times: [string, string, string], people: string[], pots: number, loadKg: number, maxKg: number) => ({
  craftId, run: n, departAt: `2026-04-10T${times[0]}:00.000Z`, landAt: `2026-04-10T${times[1]}:00.000Z`, returnAt: `2026-04-10T${times[2]}:00.000Z`, people, pots, loadKg, loadShare: loadKg / maxKg,
});

export const plan = (): TripPlanJson => ({
  status: 'optimal',
  solver: 'highs',
  runs: [
    run('heron', 1, ['13:00', '13:12', '13:29'], ['ann', 'mia'], 2, 178, 350),
    run('own-kai', 1, ['13:00', '13:12', '16:12'], ['kai'], 1, 111, 160),
    run('heron', 2, ['13:39', '13:51', '16:12'], ['ben'], 4, 192, 350),
  ],
  lastLandingAt: '2026-04-10T13:51:00.000Z',
  unplaced: {
    pots: 1,
    // Details as the planner writes them: ids and UTC clock times.
    potReasons: [{ count: 1, reason: 'window-too-short', detail: 'the runs that can be unloaded before the window closes at 16:00 UTC carry at most 7 pots' }],
    people: [{ id: 'zoe', reason: 'no-seat', detail: 'no craft going out has a seat left' }],
  },
  idleCraft: [{ craftId: 'pelican', reason: 'no-operator', detail: 'pelican needs a qualified operator within its load margin; there is none on the crew' }],
  gap: 0,
  warnings: [],
});

export const sheetInput = (over: Partial<TripSheetInput> = {}): TripSheetInput => ({
  organisation: { name: 'Test Shoreline Trust', contactEmail: 'hello@shoreline.example', units: 'ft', timeZone: 'America/New_York' },
  workday: { title: 'Spring planting', siteName: 'Heron Point', launchName: 'Mill Creek ramp', meetingPoint: '' },
  coordinator: { name: 'Cora Lane', email: 'cora@shoreline.example', phone: '727-555-0100' },
  instance: instance(),
  plan: plan(),
  source: 'solver',
  planUpdatedAt: Date.parse('2026-04-08T20:30:00.000Z'),
  craft: [
    { id: 'heron', name: 'Heron', kind: 'canoe', seats: 2, maxLoadKg: 350, hasCapacityPlate: false, potSlots: 6, needsOperator: false, draftM: 0.15, colour: null, notes: 'green hull', ownerName: null },
    { id: 'own-kai', name: null, kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 160, hasCapacityPlate: false, potSlots: 1, needsOperator: false, draftM: null, colour: null, notes: '', ownerName: 'Kai Reyes' },
    { id: 'pelican', name: 'Pelican', kind: 'skiff', seats: 4, maxLoadKg: 450, hasCapacityPlate: true, potSlots: 10, needsOperator: true, draftM: 0.3, colour: 'white', notes: '', ownerName: null },
  ],
  people: [
    { id: 'ann', name: 'Ann Ortiz', phone: '727-555-0111', emergencyContact: { name: 'Raul Ortiz', phone: '727-555-0112' }, minor: false, guardian: null },
    { id: 'mia', name: 'Mia Ortiz', phone: null, emergencyContact: null, minor: true, guardian: { name: 'Ann Ortiz', phone: '727-555-0111' } },
    { id: 'ben', name: 'Ben Shaw', phone: null, emergencyContact: { name: 'Lee Shaw', phone: '727-555-0122' }, minor: false, guardian: null },
    { id: 'kai', name: 'Kai Reyes', phone: '727-555-0133', emergencyContact: null, minor: false, guardian: null },
    { id: 'zoe', name: 'Zoe Park', phone: null, emergencyContact: null, minor: false, guardian: null },
  ],
  ...over,
});

const blockText = (b: SheetBlock): string[] => {
  if (b.kind === 'facts') return b.rows.map((r) => `${r.label}: ${r.value}`);
  if (b.kind === 'table') return [b.columns.map((c) => c.label).join(' | '), ...b.rows.map((r) => r.join(' | '))];
  if (b.kind === 'paragraph') return [b.text];
  return b.items;
};

/** A section's lines, for assertions. */
export function sectionLines(sheet: PrintableSheet, heading: string): string[] {
  const section = sheet.sections.find((s) => s.heading === heading);
  if (!section) throw new Error(`no section ${heading}: ${sheet.sections.map((s) => s.heading).join(', ')}`);
  return section.blocks.flatMap(blockText);
}

export const allText = (sheet: PrintableSheet) => sheet.sections.flatMap((s) => [s.heading, ...s.blocks.flatMap(blockText)]).join('\n');
