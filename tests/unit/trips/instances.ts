/**
 * Invented, deterministic trip instances for tests and `npm run bench`: a demo-sized day
 * (40 people, 120 pots, 15 craft) and a large one (200 people, 600 pots, 40 craft). Weights come
 * from a fixed-seed generator so every run sees the same instance.
 */
import type { TripCraft, TripInstance, TripPerson } from '../../../server/domain/trips/types.js';

export const T0 = Date.UTC(2026, 11, 5, 13, 0);
export const minutes = (m: number) => T0 + m * 60_000;

/** Park–Miller minimal standard generator: deterministic, good enough for invented weights. */
function seeded(seed: number): () => number {
  let s = seed;
  return () => (s = (s * 48271) % 2147483647) / 2147483647;
}

interface FleetMix {
  skiffs: number;
  canoes: number;
  tandems: number;
  sitOnTops: number;
  owned: number;
}

function fleet(mix: FleetMix): TripCraft[] {
  const out: TripCraft[] = [];
  for (let i = 1; i <= mix.skiffs; i++) {
    out.push({ id: `skiff-${i}`, kind: 'skiff', seats: i % 2 ? 6 : 5, maxLoadKg: i % 2 ? 700 : 550, potSlots: i % 2 ? 10 : 8, speedKmh: i % 2 ? 12 : 10, needsOperator: true });
  }
  for (let i = 1; i <= mix.canoes; i++) out.push({ id: `canoe-${i}`, kind: 'canoe', seats: 3, maxLoadKg: 430, potSlots: 4, speedKmh: 5, needsOperator: false });
  for (let i = 1; i <= mix.tandems; i++) out.push({ id: `tandem-${i}`, kind: 'tandem-kayak', seats: 2, maxLoadKg: 250, potSlots: 2, speedKmh: 5.5, needsOperator: false });
  for (let i = 1; i <= mix.sitOnTops; i++) {
    const owner = i <= mix.owned ? { ownerId: `p${i}` } : {};
    out.push({ id: `sot-${i}`, kind: 'sit-on-top-kayak', seats: 1, maxLoadKg: 160, potSlots: 1, speedKmh: 5, needsOperator: false, ...owner });
  }
  return out;
}

interface CrewMix {
  people: number;
  owners: number;
  operators: number;
  paddlers: number;
  minors: number;
  weighed: number;
}

/** p1… are owners (paddlers), then operators, then paddlers, then minors (each with an earlier adult), then planters. */
function crew(mix: CrewMix, seed: number): TripPerson[] {
  const rnd = seeded(seed);
  const out: TripPerson[] = [];
  for (let i = 1; i <= mix.people; i++) {
    const id = `p${i}`;
    let skills: string[] = [];
    if (i <= mix.owners) skills = ['paddler'];
    else if (i <= mix.owners + mix.operators) skills = ['operator'];
    else if (i <= mix.owners + mix.operators + mix.paddlers) skills = ['paddler'];
    const minor = i > mix.people - mix.minors;
    const person: TripPerson = { id, skills };
    if (minor) person.guardianId = `p${mix.people - mix.minors - (mix.people - i) * 2}`;
    if (minor) person.weightKg = 45 + Math.round(rnd() * 15);
    else if (i % Math.max(1, Math.floor(mix.people / mix.weighed)) === 0) person.weightKg = 55 + Math.round(rnd() * 45);
    out.push(person);
  }
  return out;
}

/** 40 people, 120 pots, 15 craft, a three-hour window. */
export function demoInstance(): TripInstance {
  return {
    window: { start: minutes(0), end: minutes(180) },
    route: { distanceKm: 1.6, loadMinutes: 8, unloadMinutes: 5 },
    plantingMinutesPerTree: 20,
    craft: fleet({ skiffs: 2, canoes: 4, tandems: 4, sitOnTops: 5, owned: 3 }),
    people: crew({ people: 40, owners: 3, operators: 3, paddlers: 12, minors: 3, weighed: 10 }, 7),
    pots: { count: 120, massKg: 25 },
  };
}

/** 200 people, 600 pots, 40 craft, a four-hour window. */
export function largeInstance(): TripInstance {
  return {
    window: { start: minutes(0), end: minutes(240) },
    route: { distanceKm: 1.6, loadMinutes: 8, unloadMinutes: 5 },
    plantingMinutesPerTree: 20,
    craft: fleet({ skiffs: 5, canoes: 10, tandems: 12, sitOnTops: 13, owned: 6 }),
    people: crew({ people: 200, owners: 6, operators: 7, paddlers: 60, minors: 10, weighed: 50 }, 11),
    pots: { count: 600, massKg: 25 },
  };
}

/** The demo-size day with a recorded pot mass per tree: 120 invented masses from 22 to 33.9 kg in a fixed pattern. */
export function demoInstanceWithPotMasses(): TripInstance {
  const masses = Array.from({ length: 120 }, (_, i) => 22 + ((i * 37) % 120) / 10);
  return { ...demoInstance(), pots: { count: 120, massKg: 25, masses } };
}
