/**
 * A small fixed day solved once when a solver thread starts. The first MILP in a thread also pays
 * for compiling HiGHS's WebAssembly code paths (about a second here); doing that up front keeps it
 * out of the first coordinator's time limit.
 */
import type { TripCraft, TripInstance, TripPerson } from './types.js';

const START = Date.UTC(2026, 0, 1, 13, 0);
const MINUTE = 60_000;

export function warmUpInstance(): TripInstance {
  const craft: TripCraft[] = [
    { id: 'skiff', kind: 'skiff', seats: 5, maxLoadKg: 600, potSlots: 8, speedKmh: 10, needsOperator: true },
    { id: 'canoe-1', kind: 'canoe', seats: 3, maxLoadKg: 430, potSlots: 4, speedKmh: 5, needsOperator: false },
    { id: 'canoe-2', kind: 'canoe', seats: 3, maxLoadKg: 430, potSlots: 4, speedKmh: 5, needsOperator: false },
    { id: 'tandem', kind: 'tandem-kayak', seats: 2, maxLoadKg: 250, potSlots: 2, speedKmh: 5.5, needsOperator: false },
    { id: 'sot', kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 160, potSlots: 1, speedKmh: 5, needsOperator: false, ownerId: 'p1' },
  ];
  const skills = (i: number): string[] => (i === 1 || (i >= 3 && i <= 6) ? ['paddler'] : i === 2 ? ['operator'] : []);
  const people: TripPerson[] = Array.from({ length: 14 }, (_, k) => ({ id: `p${k + 1}`, skills: skills(k + 1), ...(k % 4 === 0 ? { weightKg: 70 + k } : {}) }));
  people.push({ id: 'p15', skills: [], guardianId: 'p7', weightKg: 48 });
  return {
    window: { start: START, end: START + 150 * MINUTE },
    route: { distanceKm: 1.2, loadMinutes: 8, unloadMinutes: 5 },
    plantingMinutesPerTree: 20,
    craft,
    people,
    pots: { count: 30, massKg: 25 },
  };
}
