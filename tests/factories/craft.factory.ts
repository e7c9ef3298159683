import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { Craft } from '../../server/db/entities/craft.entity.js';

/** A request body for an invented canoe with a unique name. */
export function craftBody(overrides: Partial<Craft> = {}) {
  return { name: `Test canoe ${randomBytes(4).toString('hex')}`, kind: 'canoe' as const, seats: 2, maxLoadKg: 350, potSlots: 4, speedKmh: 4, ...overrides };
}

export async function buildCraft(db: DataSource, overrides: Partial<Craft> = {}): Promise<Craft> {
  const repo = db.getRepository(Craft);
  return repo.save(repo.create(craftBody(overrides)));
}
