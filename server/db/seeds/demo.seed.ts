import type { DataSource } from 'typeorm';
import type { TideStationDirectory } from '../../adapters/tide-stations.js';
import type { PasswordHasher } from '../../services/password-hasher.js';
import { Organisation } from '../entities/organisation.entity.js';
import { Site } from '../entities/site.entity.js';
import { User } from '../entities/user.entity.js';
import { DEMO_PASSWORD, demoPeople } from './demo-people.js';
import { demoSites } from './demo-sites.js';
import { seedDemoWorkdays } from './demo-workdays.js';
import { seedDemoNursery } from './demo-nursery.js';
import { seedDemoFleet } from './demo-fleet.js';
import { seedDemoGiving } from './demo-giving.js';
import { seedDemoOutcomes } from './demo-outcomes.js';

/**
 * Seeds the demo organisation once: rows are inserted only when missing (by e-mail), so a
 * second start adds nothing. All demo people share one password hash, computed once.
 */
export async function seedDemo(deps: { db: DataSource; hasher: PasswordHasher; now: Date; stations?: TideStationDirectory }): Promise<{ created: number; workdays: number; trees: number }> {
  await seedDemoOrganisation(deps.db);
  await deps.db.getRepository(Site).createQueryBuilder().insert().values(demoSites).orIgnore().execute();
  const created = await seedDemoPeople(deps);
  const workdays = deps.stations ? await seedDemoWorkdays({ db: deps.db, stations: deps.stations, now: deps.now }) : 0;
  const trees = await seedDemoNursery({ db: deps.db, now: deps.now });
  // After the nursery: the boat day reserves ready trees.
  await seedDemoFleet({ db: deps.db, stations: deps.stations, now: deps.now });
  // After the nursery too: demo gifts sponsor nursery trees.
  await seedDemoGiving({ db: deps.db, now: deps.now });
  // Last: planted cohorts take fresh tags after the nursery's, and use the completed demo workday.
  await seedDemoOutcomes({ db: deps.db, now: deps.now });
  return { created, workdays, trees };
}

async function seedDemoPeople(deps: { db: DataSource; hasher: PasswordHasher; now: Date }): Promise<number> {
  const repo = deps.db.getRepository(User);
  const existing = new Set((await repo.find({ select: { email: true } })).map((u) => u.email));
  const missing = demoPeople.filter((p) => !existing.has(p.email));
  if (missing.length === 0) return 0;
  const passwordHash = await deps.hasher.hash(DEMO_PASSWORD);
  const rows = missing.map((p) => ({
    name: p.name,
    email: p.email,
    role: p.role,
    passwordHash,
    emailVerifiedAt: p.verified ? deps.now : null,
  }));
  await repo.createQueryBuilder().insert().values(rows).orIgnore().execute();
  return missing.length;
}

/** Names the organisation after the demo scenario, once: only while it still has the default name. */
async function seedDemoOrganisation(db: DataSource): Promise<void> {
  await db.getRepository(Organisation).update(
    { id: 1, name: 'Restoration program' },
    {
      name: 'Bayhaven Shoreline Trust',
      legalName: 'Bayhaven Shoreline Trust, Inc. (demo)',
      taxId: '00-0000000',
      contactEmail: 'hello@demo.ebbroot.test',
      units: 'ft',
      timeZone: 'America/New_York',
      isDemo: true,
    },
  );
}
