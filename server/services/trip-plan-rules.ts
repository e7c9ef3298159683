/** The organisation's trip settings, as the trip planner and day capacity use them. */
import type { DataSource } from 'typeorm';
import { DEFAULT_TRIP_RULES, TripRules } from '../../shared/schemas/organisation.schema.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import type { LoadMargin } from '../domain/trips/index.js';

/** The saved settings, each value that is missing or out of range replaced by its default. */
export async function loadTripRules(db: DataSource): Promise<TripRules> {
  const saved: Partial<Record<keyof TripRules, unknown>> = (await db.getRepository(Organisation).findOneBy({ id: 1 }))?.tripRules ?? {};
  const rules: TripRules = { ...DEFAULT_TRIP_RULES };
  for (const key of Object.keys(TripRules.shape) as (keyof TripRules)[]) {
    const value = TripRules.shape[key].safeParse(saved[key]);
    if (value.success) rules[key] = value.data;
  }
  return rules;
}

export const marginOf = (rules: TripRules): LoadMargin => ({ paddlecraft: rules.paddlecraftMargin, plated: rules.platedMargin });

const percent = (share: number) => `${Math.round(share * 100)} %`;

/** The load margins in plain words, with where each comes from. */
export function marginNote(margin: LoadMargin): string {
  return (
    `Loads are planned to at most ${percent(margin.paddlecraft)} of a kayak's or canoe's rated load (common practice from paddling guidance) ` +
    `and ${percent(margin.plated)} of a capacity plate (the plate is the legal limit).`
  );
}
