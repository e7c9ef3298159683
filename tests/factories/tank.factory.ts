import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { SalinityReading } from '../../server/db/entities/salinity-reading.entity.js';
import { Tank } from '../../server/db/entities/tank.entity.js';

/** A 20 L nursery tank with a unique invented name. */
export async function buildTank(db: DataSource, overrides: Partial<Tank> = {}): Promise<Tank> {
  const repo = db.getRepository(Tank);
  return repo.save(repo.create({ name: `Tank ${randomBytes(4).toString('hex')}`, volumeLitres: 20, ...overrides }));
}

/** A refractometer reading of a tank. */
export async function buildReading(db: DataSource, tankId: string, salinityPpt: number, takenAt: Date): Promise<SalinityReading> {
  const repo = db.getRepository(SalinityReading);
  return repo.save(repo.create({ tankId, salinityPpt, takenAt, method: 'refractometer' }));
}
