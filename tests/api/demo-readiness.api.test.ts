/**
 * The demo nursery on a fresh database: a handful of trees truly ready for a demo site, the rest
 * not ready for reasons a coordinator can read. The later demo seeds (boat day, gifts, planted
 * cohorts) still find what they need.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IsNull, Not } from 'typeorm';
import type { SiteReadinessDto } from '../../shared/schemas/nursery.schema.js';
import { createTideStationDirectory } from '../../server/adapters/tide-stations.js';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { Site } from '../../server/db/entities/site.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { seedDemo } from '../../server/db/seeds/demo.seed.js';
import { createPasswordHasher } from '../../server/services/password-hasher.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

const now = new Date('2026-12-01T15:00:00Z');
let t: TestApp;
let heron: SiteReadinessDto;

beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'demo_readiness', clock: () => now });
  const seeded = await seedDemo({ db: t.db, hasher: createPasswordHasher(10), now, stations: createTideStationDirectory() });
  expect(seeded.trees).toBe(150);
  const site = await t.db.getRepository(Site).findOneByOrFail({ name: 'Heron Reach' });
  const { agent } = await authAgentFor(t, 'coordinator');
  const res = await agent.get(`/api/sites/${site.id}/readiness`).expect(200);
  heron = res.body as SiteReadinessDto;
}, 120_000);
afterAll(() => t.close());

const byTank = (name: string) => heron.trees.filter((tree) => tree.tank?.name === name);

describe('demo nursery readiness for Heron Reach', () => {
  it('has a realistic handful of trees ready, all in the tank held at the site salinity', () => {
    const ready = heron.trees.filter((tree) => tree.ready);
    expect(ready.length).toBeGreaterThanOrEqual(8);
    expect(ready.length).toBeLessThanOrEqual(15);
    for (const tree of ready) {
      expect(tree).toMatchObject({ stage: 'ready', tank: { name: 'Tank C (brining)' }, reasons: [], heightShortfallCm: 0 });
      // 21 days is the default hold (readiness.ts); the demo tank has held for six weeks.
      expect(tree.heldDays).toBeGreaterThanOrEqual(30);
      expect(tree.crownTopM).toBeGreaterThanOrEqual(tree.requiredTopM);
    }
  });

  it('says the late, short trees in that tank need more height, and nothing else', () => {
    const short = byTank('Tank C (brining)').filter((tree) => tree.stage === 'brining');
    expect(short.length).toBeGreaterThan(0);
    for (const tree of short) {
      expect(tree.ready).toBe(false);
      expect(tree.reasons.map((r) => r.code)).toEqual(['crown_submerged']);
      expect(tree.reasons[0]!.message).toMatch(/^Needs \d+ cm more height/);
    }
  });

  it('says the trees in the tank still being brought up need more days at the site salinity', () => {
    const holding = byTank('Tank D (brining)');
    expect(holding.length).toBeGreaterThan(0);
    for (const tree of holding) {
      expect(tree.ready).toBe(false);
      expect(tree.heldDays).toBe(10);
      expect(tree.reasons.find((r) => r.code === 'salinity_hold')?.message).toBe('Needs 11 more days at 24 ppt (held 10 of 21 days).');
    }
  });

  it('leaves the later demo seeds working: the boat day reserves trees and gifts sponsor them', async () => {
    expect(await t.db.getRepository(Tree).countBy({ reservedWorkdayId: Not(IsNull()) })).toBe(24);
    expect(await t.db.getRepository(Tree).countBy({ sponsorDonationId: Not(IsNull()) })).toBeGreaterThan(0);
    expect(await t.db.getRepository(Donation).count()).toBe(7);
  });
});
