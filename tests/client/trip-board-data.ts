/**
 * Invented data for the trip board's client tests: a three-hour window on Sat 15 Mar 2025
 * (08:00–11:00 EDT), a skiff that makes two runs, a canoe that makes one, an idle kayak, five
 * people (a boat operator, a paddler, a planter, a parent and their child) and 18 pots of 27 kg.
 *
 * Timing (the planner's model): 1.4 km at 12 km/h is 7 min, at 4 km/h 21 min; unloading 5 min,
 * loading 10 min. Skimmer run 1 leaves 12:00Z, lands 12:07, is back 12:19; run 2 leaves 12:29,
 * lands 12:36 and, being the last, waits for the close (15:00) and is back 15:07. Tarpon leaves
 * 12:00, lands 12:21 and is back 15:21. Loads at the standard 84 kg a person: Skimmer run 1
 * 2 × 84 + 8 × 27 = 384 kg of 408.2 (94 %), run 2 84 + 216 = 300 kg (73 %), Tarpon 3 × 84 + 27 =
 * 279 kg of 430.9 (65 %).
 */
import { http, HttpResponse } from 'msw';
import type { RosterRow } from '@shared/schemas/roster.schema';
import type { Craft } from '@shared/schemas/trips.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import type { StoredTripPlan } from '@/api/trip-plans';
import { server } from '../setup/client-setup';
import { buildRosterRow, buildWorkdayDto } from './support/workday-manage';
import { buildDayTide } from './support/workdays';

export const IDS = {
  skiff: '0a000000-0000-4000-8000-000000000001',
  canoe: '0a000000-0000-4000-8000-000000000002',
  kayak: '0a000000-0000-4000-8000-000000000003',
  ana: '0b000000-0000-4000-8000-000000000001',
  ben: '0b000000-0000-4000-8000-000000000002',
  cleo: '0b000000-0000-4000-8000-000000000003',
  dev: '0b000000-0000-4000-8000-000000000004',
  eli: '0b000000-0000-4000-8000-000000000005',
} as const;

export function buildFleetCraft(overrides: Partial<Craft> = {}): Craft {
  return {
    id: IDS.canoe, name: 'Tarpon', kind: 'canoe', seats: 3, maxLoadKg: 430.9, hasCapacityPlate: false, potSlots: 6, draftM: 0.13, speedKmh: 4,
    needsOperator: false, active: true, notes: '', createdAt: '2025-01-05T10:00:00.000Z', updatedAt: '2025-01-05T10:00:00.000Z', ...overrides,
  };
}

export const fleet: Craft[] = [
  buildFleetCraft({ id: IDS.skiff, name: 'Skimmer', kind: 'skiff', seats: 5, maxLoadKg: 408.2, hasCapacityPlate: true, potSlots: 8, draftM: 0.3, speedKmh: 12, needsOperator: true }),
  buildFleetCraft(),
  buildFleetCraft({ id: IDS.kayak, name: 'Ibis', kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 158.8, potSlots: 1, draftM: 0.1 }),
];

export const roster: RosterRow[] = [
  buildRosterRow({ userId: IDS.ana, name: 'Ana Ruiz', role: 'operator' }),
  buildRosterRow({ userId: IDS.ben, name: 'Ben Okoro', role: 'seat' }),
  buildRosterRow({ userId: IDS.cleo, name: 'Cleo Marsh', role: 'planter' }),
  buildRosterRow({ userId: IDS.dev, name: 'Dev Patel', role: 'planter' }),
  buildRosterRow({ userId: IDS.eli, name: 'Eli Patel', role: 'planter', isMinor: true, guardianName: 'Dev Patel' }),
];

const run = (craftId: string, n: number, times: [string, string, string], people: string[], pots: number, loadKg: number, max: number) => ({
  craftId, run: n, departAt: `2025-03-15T${times[0]}:00.000Z`, landAt: `2025-03-15T${times[1]}:00.000Z`, returnAt: `2025-03-15T${times[2]}:00.000Z`,
  people, pots, loadKg, loadShare: loadKg / max,
});

export function buildStoredPlan(overrides: Partial<StoredTripPlan['plan']> = {}): StoredTripPlan {
  return {
    source: 'solver',
    instance: {
      window: { start: '2025-03-15T12:00:00.000Z', end: '2025-03-15T15:00:00.000Z' },
      route: { distanceKm: 1.4, loadMinutes: 10, unloadMinutes: 5 },
      plantingMinutesPerTree: 20,
      craft: fleet.map((c) => ({ id: c.id, kind: c.kind, seats: c.seats, maxLoadKg: c.maxLoadKg, potSlots: c.potSlots, speedKmh: c.speedKmh, draftM: c.draftM, needsOperator: c.needsOperator })),
      people: [
        { id: IDS.ana, skills: ['operator'], guardianId: null },
        { id: IDS.ben, skills: ['paddler'], guardianId: null },
        { id: IDS.cleo, skills: [], guardianId: null },
        { id: IDS.dev, skills: [], guardianId: null },
        { id: IDS.eli, skills: [], guardianId: IDS.dev },
      ],
      pots: { count: 18, massKg: 27 },
    },
    plan: {
      status: 'optimal',
      runs: [
        run(IDS.skiff, 1, ['12:00', '12:07', '12:19'], [IDS.ana, IDS.cleo], 8, 384, 408.2),
        run(IDS.canoe, 1, ['12:00', '12:21', '15:21'], [IDS.ben, IDS.dev, IDS.eli], 1, 279, 430.9),
        run(IDS.skiff, 2, ['12:29', '12:36', '15:07'], [IDS.ana], 8, 300, 408.2),
      ],
      lastLandingAt: '2025-03-15T12:36:00.000Z',
      unplaced: { pots: 1, potReasons: [{ count: 1, reason: 'pot-slots', detail: `every pot slot on ${IDS.skiff} and ${IDS.canoe} is taken` }], people: [] },
      idleCraft: [{ craftId: IDS.kayak, reason: 'no-paddler', detail: `${IDS.kayak} needs an adult with the paddler skill; there is none on the crew` }],
      solver: 'highs',
      gap: 0,
      warnings: [],
      ...overrides,
    },
  };
}

/** The workday the board belongs to, with its site clock in New York. */
export function buildBoardWorkday(): WorkdayDto {
  return buildWorkdayDto({ title: 'Planting at Heron Cove', startsAt: '2025-03-15T12:00:00.000Z', endsAt: '2025-03-15T15:00:00.000Z' });
}

export interface BoardRequests {
  built: unknown[];
  saved: { runs: { craftId: string; run: number; people: string[]; pots: number }[] }[];
}

/**
 * Answers the board's loads: the workday, its plan (`plan` null answers 404), roster, fleet and
 * tide; POST answers `built` (default the plan); PUT answers with `onSave` (default: accept).
 */
export function mockBoard(workday: WorkdayDto, options: { plan?: StoredTripPlan | null; built?: StoredTripPlan; onSave?: (body: BoardRequests['saved'][number]) => Response } = {}): BoardRequests {
  const seen: BoardRequests = { built: [], saved: [] };
  let current = options.plan === undefined ? buildStoredPlan() : options.plan;
  const path = `/api/workdays/${workday.id}/trip-plan`;
  server.use(
    http.get(`/api/workdays/${workday.id}`, () => HttpResponse.json({ workday })),
    http.get(`/api/workdays/${workday.id}/roster`, () => HttpResponse.json({ roster })),
    http.get(`/api/workdays/${workday.id}/tide`, () => HttpResponse.json(buildDayTide())),
    http.get('/api/fleet', () => HttpResponse.json({ craft: fleet })),
    http.get(path, () => (current ? HttpResponse.json(current) : HttpResponse.json({ error: { code: 'not_found', message: 'Trip plan not found' } }, { status: 404 }))),
    http.post(path, async ({ request }) => {
      seen.built.push(await request.json());
      current = options.built ?? buildStoredPlan();
      return HttpResponse.json(current, { status: 201 });
    }),
    http.put(path, async ({ request }) => {
      const body = (await request.json()) as BoardRequests['saved'][number];
      seen.saved.push(body);
      if (options.onSave) return options.onSave(body);
      const base = current ?? buildStoredPlan();
      current = { ...base, source: 'edited', plan: { ...base.plan, status: 'feasible', runs: base.plan.runs.map((r, i) => ({ ...r, ...body.runs[i] })) } };
      return HttpResponse.json(current);
    }),
  );
  return seen;
}
