/** What several nursery services share: the organisation's rules and day, photo URLs, domain errors. */
import type { DataSource, EntityManager } from 'typeorm';
import { DEFAULT_NURSERY_RULES, NurseryRules } from '../../shared/schemas/nursery.schema.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { NurseryInputError } from '../domain/nursery/errors.js';
import { localDate } from '../domain/tide/time-zone.js';
import { ValidationError } from '../errors.js';

export interface NurserySettings {
  rules: NurseryRules;
  timeZone: string;
}

/** The organisation's readiness rules (defaults for anything unreadable) and its time zone. */
export async function nurserySettings(db: DataSource | EntityManager): Promise<NurserySettings> {
  const org = await db.getRepository(Organisation).findOneBy({ id: 1 });
  const parsed = NurseryRules.safeParse({ ...DEFAULT_NURSERY_RULES, ...(org?.nurseryRules ?? {}) });
  return { rules: parsed.success ? parsed.data : DEFAULT_NURSERY_RULES, timeZone: org?.timeZone ?? 'America/New_York' };
}

/** The calendar date of an instant where the nursery is. */
export const dayIn = (at: Date, timeZone: string) => localDate(at.getTime(), timeZone);

/** Runs a nursery computation; input it cannot answer becomes a 400 on the offending field. */
export function nurseryInput<T>(fn: () => T, fieldNames: Record<string, string> = {}): T {
  try {
    return fn();
  } catch (err) {
    if (!(err instanceof NurseryInputError)) throw err;
    throw new ValidationError(err.message, { [fieldNames[err.field] ?? err.field]: [err.message] });
  }
}

export const photoUrl = (photoId: string | null) => (photoId ? `/api/photos/${photoId}` : null);
export const thumbUrl = (photoId: string | null) => (photoId ? `/api/photos/${photoId}/thumb` : null);
