/**
 * Small hand-built trip instances whose optimal plans are worked out by hand in the tests.
 * All start at T0 (2026-12-05 13:00 UTC); `at('13:45')` is an instant that day.
 */
import type { TripCraft, TripInstance, TripPerson } from '../../../server/domain/trips/types.js';
import { T0 } from './instances.js';

export const at = (hhmm: string) => Date.parse(`2026-12-05T${hhmm}:00Z`);

export const canoe = (over: Partial<TripCraft> = {}): TripCraft => ({
  id: 'canoe-1', kind: 'canoe', seats: 2, maxLoadKg: 400, potSlots: 4, speedKmh: 4, needsOperator: false, ...over,
});

export const person = (id: string, over: Partial<TripPerson> = {}): TripPerson => ({ id, skills: [], weightKg: 80, ...over });

/**
 * One canoe (2 seats, rated 400 kg → 280 kg at the 70 % paddlecraft margin, 4 pot slots,
 * 4 km/h), Ann (paddler, 70 kg) and Bob (80 kg), 6 pots of 25 kg, 1 km route, 10 min to load,
 * 5 to unload, a two-hour window 13:00–15:00, 10 min per tree per pair.
 */
export function oneCanoe(): TripInstance {
  return {
    window: { start: T0, end: T0 + 120 * 60_000 },
    route: { distanceKm: 1, loadMinutes: 10, unloadMinutes: 5 },
    plantingMinutesPerTree: 10,
    craft: [canoe()],
    people: [person('ann', { skills: ['paddler'], weightKg: 70 }), person('bob')],
    pots: { count: 6, massKg: 25 },
  };
}

/**
 * A skiff that needs an operator (3 seats, 400 kg plate, 6 pot slots, 6 km/h) and two owner-less
 * sit-on-top kayaks (1 seat, rated 150 kg → 105 kg, 1 pot slot, 4 km/h); Olive (operator,
 * 80 kg), Pat and Paz (paddlers, 70 kg), Cy (80 kg); 14 pots of 20 kg; 1 km route, 10 min
 * load, 5 unload, 13:00–15:00, 5 min per tree per pair.
 */
export function skiffAndKayaks(): TripInstance {
  const kayak = (id: string): TripCraft => ({ id, kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 150, potSlots: 1, speedKmh: 4, needsOperator: false });
  return {
    window: { start: T0, end: T0 + 120 * 60_000 },
    route: { distanceKm: 1, loadMinutes: 10, unloadMinutes: 5 },
    plantingMinutesPerTree: 5,
    craft: [{ id: 'skiff-1', kind: 'skiff', seats: 3, maxLoadKg: 400, potSlots: 6, speedKmh: 6, needsOperator: true }, kayak('kayak-1'), kayak('kayak-2')],
    people: [
      person('olive', { skills: ['operator'] }),
      person('pat', { skills: ['paddler'], weightKg: 70 }),
      person('paz', { skills: ['paddler'], weightKg: 70 }),
      person('cy'),
    ],
    pots: { count: 14, massKg: 20 },
  };
}
