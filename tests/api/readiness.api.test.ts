/**
 * Readiness of hand-built trees for an invented site tied to the real NOAA station Safety Harbor
 * (noaa/8726738), on a fixed clock (1 June 2026). The crown rule is the default "top above MHHW":
 * NOAA publishes MHHW 1.422 m and MLLW 0.572 m above the station datum (epoch 1983–2001; source S8
 * in tests/fixtures/tide/published-datums.json), so MHHW is 0.850 m above MLLW and MSL 0.452 m;
 * one predicted year differs from the 19-year epoch by a few centimetres. Collar caution: Lewis
 * 2005 (≤ about 30% of the time flooded); bed below MSL: Teas 1977 (TRADE.md §3).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import type { Site } from '../../server/db/entities/site.entity.js';
import type { Tank } from '../../server/db/entities/tank.entity.js';
import { buildSite } from '../factories/site.factory.js';
import { buildReading, buildTank } from '../factories/tank.factory.js';
import { buildMeasurement, buildTree } from '../factories/tree.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

const NOW = new Date('2026-06-01T14:00:00Z');
const PUBLISHED_MHHW_M = 1.422 - 0.572;
const PUBLISHED_MSL_M = 1.024 - 0.572;
let t: TestApp;
let volunteer: Awaited<ReturnType<typeof authAgentFor>>;
let site: Site;
let heldTank: Tank;
let shortHoldTank: Tank;
beforeAll(async () => {
  t = await createTestApp({ clock: () => NOW });
  volunteer = await authAgentFor(t, 'volunteer');
  site = await buildSite(t.db, { salinityPpt: 30 }); // bed 0.20 m above MLLW
  heldTank = await buildTank(t.db, { targetSiteId: site.id });
  await buildReading(t.db, heldTank.id, 30.5, daysAgo(30));
  await buildReading(t.db, heldTank.id, 29.5, daysAgo(5));
  shortHoldTank = await buildTank(t.db);
  await buildReading(t.db, shortHoldTank.id, 25, daysAgo(20));
  await buildReading(t.db, shortHoldTank.id, 30, daysAgo(10));
});
afterAll(() => t.close());

function daysAgo(n: number) {
  return new Date(NOW.getTime() - n * 86_400_000);
}
const addDays = (date: string, n: number) => new Date(Date.parse(`${date}T00:00:00Z`) + n * 86_400_000).toISOString().slice(0, 10);

describe('GET /api/sites/:id/readiness', () => {
  it('spells out each reason for a short tree still short of its hold, with cautions and a ready-by date', async () => {
    // 30 cm pot on a 0.20 m bed, 20 cm tall: top at 0.70 m, growing 0.1 cm a day.
    const tree = await buildTree(t.db, { stage: 'brining', tankId: shortHoldTank.id, potHeightCm: 30, heightCm: 20 });
    await buildMeasurement(t.db, tree.id, 14, new Date('2026-04-01T14:00:00Z'));
    await buildMeasurement(t.db, tree.id, 17, new Date('2026-05-01T14:00:00Z'));
    await buildMeasurement(t.db, tree.id, 20, new Date('2026-05-31T14:00:00Z'));
    const res = await volunteer.agent.get(`/api/sites/${site.id}/readiness`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ site: { id: site.id, name: site.name, salinityPpt: 30 }, today: '2026-06-01' });
    expect(res.body.mhhwM).toBeCloseTo(PUBLISHED_MHHW_M, 1);
    expect(res.body.mslM).toBeCloseTo(PUBLISHED_MSL_M, 1);
    const r = res.body.trees.find((x: { treeId: string }) => x.treeId === tree.id);
    const shortfall = Math.ceil((res.body.mhhwM - 0.7) * 100 - 1e-6);
    expect(r).toMatchObject({
      tag: tree.tag, stage: 'brining', ready: false, crownTopM: 0.7, heightShortfallCm: shortfall, heldDays: 10,
      reasons: [
        { code: 'crown_submerged', message: `Needs ${shortfall} cm more height: its top is 0.70 m above MLLW, under MHHW (${res.body.mhhwM.toFixed(2)} m).` },
        { code: 'salinity_hold', message: 'Needs 11 more days at 30 ppt (held 10 of 21 days).' },
      ],
      cautions: [{ code: 'collar_flooded', message: expect.stringContaining('Lewis 2005') }, { code: 'bed_below_msl', message: expect.stringContaining('Teas 1977') }],
      readyBy: addDays('2026-05-31', shortfall * 10),
    });
    expect(shortfall).toBeGreaterThanOrEqual(12);
    expect(shortfall).toBeLessThanOrEqual(18);
    expect(r.collarFloodedShare).toBeGreaterThan(0.3);
    expect(r.crownSubmergedShare).toBeGreaterThan(0);
  });

  it('finds a tall, healthy tree held 30 days at the site\'s salinity ready today', async () => {
    const tree = await buildTree(t.db, { stage: 'ready', tankId: heldTank.id, potHeightCm: 30, heightCm: 60 });
    const r = (await volunteer.agent.get(`/api/sites/${site.id}/readiness`)).body.trees.find((x: { treeId: string }) => x.treeId === tree.id);
    expect(r).toMatchObject({ ready: true, reasons: [], heldDays: 30, heightShortfallCm: 0, readyBy: '2026-06-01', tank: { id: heldTank.id, name: heldTank.name } });
  });

  it('lists potted trees with their stage and missing readings, and leaves collected trees out', async () => {
    const tank = await buildTank(t.db);
    const potted = await buildTree(t.db, { stage: 'potted', tankId: tank.id, potHeightCm: 30, heightCm: 60, healthy: false });
    const collected = await buildTree(t.db, { stage: 'collected' });
    const trees = (await volunteer.agent.get(`/api/sites/${site.id}/readiness`)).body.trees as { treeId: string; reasons: { code: string }[]; readyBy?: string }[];
    expect(trees.find((x) => x.treeId === collected.id)).toBeUndefined();
    const r = trees.find((x) => x.treeId === potted.id)!;
    expect(r.reasons.map((x) => x.code)).toEqual(['salinity_unknown', 'stage', 'unhealthy']);
    expect(r.readyBy).toBeUndefined();
  });

  it('says when the site has no salinity, and answers 404 for an unknown site', async () => {
    const dry = await buildSite(t.db);
    const tree = await buildTree(t.db, { stage: 'ready', tankId: heldTank.id, potHeightCm: 30, heightCm: 60 });
    const r = (await volunteer.agent.get(`/api/sites/${dry.id}/readiness`)).body.trees.find((x: { treeId: string }) => x.treeId === tree.id);
    expect(r.reasons).toEqual([{ code: 'site_salinity_unknown', message: expect.stringContaining('no salinity') }]);
    expect((await volunteer.agent.get('/api/sites/00000000-0000-4000-8000-000000000000/readiness')).status).toBe(404);
  });
});

describe('GET /api/trees/:id/readiness', () => {
  it('judges one tree for its tank\'s target site by default, or for the site asked', async () => {
    const tree = await buildTree(t.db, { stage: 'ready', tankId: heldTank.id, potHeightCm: 30, heightCm: 60 });
    const own = await volunteer.agent.get(`/api/trees/${tree.id}/readiness`);
    expect(own.status).toBe(200);
    expect(own.body).toMatchObject({ site: { id: site.id }, tree: { treeId: tree.id, ready: true } });
    const other = await buildSite(t.db, { salinityPpt: 20 });
    const there = await volunteer.agent.get(`/api/trees/${tree.id}/readiness?siteId=${other.id}`);
    expect(there.body.tree.reasons).toEqual([{ code: 'salinity_off', message: 'Tank is at 29.5 ppt; site is 20 ppt.' }]);
  });

  it('asks for a site when the tree\'s tank has no target', async () => {
    const tree = await buildTree(t.db, { stage: 'brining', tankId: shortHoldTank.id });
    const res = await volunteer.agent.get(`/api/trees/${tree.id}/readiness`);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('siteId');
  });
});
