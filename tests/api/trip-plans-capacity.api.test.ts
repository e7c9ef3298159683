import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import type { DayCapacity } from '../../shared/schemas/trip-capacity.schema.js';
import { Craft } from '../../server/db/entities/craft.entity.js';
import { buildCraft } from '../factories/craft.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  // Its own database: the figures depend on the active fleet, which other test files change.
  t = await createTestApp({ ownDatabase: 'trip_plans_capacity' });
});
afterAll(() => t.close());
beforeEach(async () => {
  await t.db.createQueryBuilder().update(Craft).set({ active: false }).where('active = true').execute();
});

async function coordinator() {
  return authAgentFor(t, 'coordinator');
}

describe('POST /api/trip-plans/capacity', () => {
  it('answers a self-contained day with the hand-worked figures', async () => {
    // The unit test's one-canoe hour (tests/unit/trips/capacity.test.ts): the canoe (2 seats,
    // 400 kg → 280 kg at the default 70 %, 4 slots, 15 min each way) is unloaded at 13:20 and
    // cannot make a second run by 14:00. A paddler and a planter at the default 84 kg leave 112 kg:
    // 4 pots of 25 kg, and the pair has (14:00 − 13:20) / 10 = 4 planting slots.
    const { agent, token } = await coordinator();
    const res = await agent.post('/api/trip-plans/capacity').set('X-CSRF-Token', token).send({
      window: { start: '2026-12-05T13:00:00Z', end: '2026-12-05T14:00:00Z' },
      route: { distanceKm: 1, loadMinutes: 10, unloadMinutes: 5 },
      craft: [{ id: 'canoe-1', kind: 'canoe', seats: 2, maxLoadKg: 400, potSlots: 4, speedKmh: 4, needsOperator: false }],
      plantingMinutesPerTree: 10,
      potMassKg: 25,
    });
    expect(res.status).toBe(200);
    expect(res.body.capacity).toMatchObject({
      window: { start: '2026-12-05T13:00:00.000Z', end: '2026-12-05T14:00:00.000Z' },
      trees: 4,
      transportPots: 4,
      plantingTrees: 4,
      skippers: 1,
      planters: 1,
      roles: { 'own-kayak': 0, seat: 1, operator: 0, shore: 2, planter: 1 },
      runs: 1,
      lastLandingAt: '2026-12-05T13:15:00.000Z',
      craftUsed: ['canoe-1'],
    });
    const notes = (res.body.capacity as DayCapacity).notes.join(' ');
    expect(notes).toMatch(/70 %.*common practice/);
    expect(notes).toMatch(/capacity plate \(the plate is the legal limit\)/);
    expect(notes).toMatch(/prevail/);
  });

  it('fills in the route from the site and the craft from the active fleet, as for a saved workday', async () => {
    const site = await buildSite(t.db, { launchDistanceM: 800 });
    await buildCraft(t.db, { seats: 2, maxLoadKg: 350, potSlots: 4, speedKmh: 4 });
    const window = { start: '2026-05-04T13:00:00.000Z', end: '2026-05-04T16:00:00.000Z' };
    const workday = await buildWorkday(t.db, { siteId: site.id, startsAt: new Date(window.start), endsAt: new Date(window.end) });
    const { agent, token } = await coordinator();
    const fromForm = await agent.post('/api/trip-plans/capacity').set('X-CSRF-Token', token).send({ window, siteId: site.id });
    const saved = await agent.get(`/api/workdays/${workday.id}/capacity`);
    expect(fromForm.status).toBe(200);
    expect(saved.status).toBe(200);
    expect(fromForm.body.capacity).toEqual(saved.body.capacity);
    expect(fromForm.body.capacity.trees).toBeGreaterThan(0);
  });

  it.each([
    [{ window: { start: '2026-05-04T13:00:00Z', end: '2026-05-04T16:00:00Z' } }, 'route'],
    [{ window: { start: '2026-05-04T16:00:00Z', end: '2026-05-04T13:00:00Z' }, route: { distanceKm: 1, loadMinutes: 5, unloadMinutes: 5 } }, 'window.end'],
    [{ window: { start: '2026-05-04T01:00:00Z', end: '2026-05-04T23:00:00Z' }, route: { distanceKm: 1, loadMinutes: 5, unloadMinutes: 5 } }, 'window.end'],
    [{ window: { start: '2026-05-04T13:00:00Z', end: '2026-05-04T16:00:00Z' }, siteId: 'nowhere' }, 'siteId'],
  ])('refuses %j with 400 on %s', async (body, field) => {
    const { agent, token } = await coordinator();
    const res = await agent.post('/api/trip-plans/capacity').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
  });

  it('answers 404 for a site that does not exist', async () => {
    const { agent, token } = await coordinator();
    const res = await agent.post('/api/trip-plans/capacity').set('X-CSRF-Token', token)
      .send({ window: { start: '2026-05-04T13:00:00Z', end: '2026-05-04T16:00:00Z' }, siteId: '00000000-0000-4000-8000-000000000000' });
    expect(res.status).toBe(404);
  });
});

describe('GET /api/workdays/:id/capacity', () => {
  it('caps the figure at the reserved trees, each at its recorded pot mass', async () => {
    // One canoe (2 seats, 350 kg → 245 kg, 4 slots, 0.8 km at 4 km/h = 12 min each way; runs are
    // unloaded at 13:17 and 13:56), trees of 31.5 kg, 24 kg and one at the default 27 kg. A paddler
    // and a planter (168 kg) leave 77 kg on run 1: the lightest first, 24 + 27 = 51; 31.5 more
    // would be 82.5. Run 2 (the paddler alone, 161 kg spare) lands the 31.5-kg pot at 13:51. The
    // pair plants from 13:56: (16:00 − 13:56) / 20 → 6 slots ≥ 3. A lone paddler plants nothing
    // (planting is by pairs) and the canoe has no third seat: 3 trees, 1 paddler, 1 planter.
    const site = await buildSite(t.db, { launchDistanceM: 800 });
    await buildCraft(t.db, { seats: 2, maxLoadKg: 350, potSlots: 4, speedKmh: 4 });
    const workday = await buildWorkday(t.db, { siteId: site.id, startsAt: new Date('2026-05-04T13:00:00Z'), endsAt: new Date('2026-05-04T16:00:00Z') });
    for (const potMassKg of [31.5, 24, null]) await buildTree(t.db, { reservedWorkdayId: workday.id, potMassKg });
    const { agent } = await coordinator();
    const res = await agent.get(`/api/workdays/${workday.id}/capacity`);
    expect(res.status).toBe(200);
    expect(res.body.capacity).toMatchObject({
      trees: 3,
      roles: { 'own-kayak': 0, seat: 1, operator: 0, shore: 2, planter: 1 },
      runs: 2,
      lastLandingAt: '2026-05-04T13:51:00.000Z',
    });
    expect((res.body.capacity as DayCapacity).notes).toContain('At most the 3 trees reserved for this workday.');
  });

  it('answers 404 for an unknown workday and 403 for a volunteer', async () => {
    const { agent } = await coordinator();
    expect((await agent.get('/api/workdays/00000000-0000-4000-8000-000000000000/capacity')).status).toBe(404);
    const volunteer = await authAgentFor(t, 'volunteer');
    const workday = await buildWorkday(t.db);
    expect((await volunteer.agent.get(`/api/workdays/${workday.id}/capacity`)).status).toBe(403);
  });
});
