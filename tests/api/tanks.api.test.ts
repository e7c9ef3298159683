import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { SalinityReading } from '../../server/db/entities/salinity-reading.entity.js';
import { Tank } from '../../server/db/entities/tank.entity.js';
import { buildSite } from '../factories/site.factory.js';
import { buildReading, buildTank } from '../factories/tank.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
let volunteer: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp();
  staff = await authAgentFor(t, 'coordinator');
  volunteer = await authAgentFor(t, 'volunteer');
});
afterAll(() => t.close());

const NO_ID = '00000000-0000-4000-8000-000000000000';
const uniqueName = (prefix: string) => `${prefix} ${Math.random().toString(36).slice(2, 8)}`;
const addReading = (tankId: string, body: object) => staff.agent.post(`/api/tanks/${tankId}/readings`).set('X-CSRF-Token', staff.token).send(body);

describe('POST /api/tanks', () => {
  it('creates a tank that volunteers see in the list with its latest reading and tree count', async () => {
    const site = await buildSite(t.db, { salinityPpt: 28 });
    const name = uniqueName('Tank');
    const res = await staff.agent.post('/api/tanks').set('X-CSRF-Token', staff.token).send({ name, volumeLitres: 18.93, targetSiteId: site.id });
    expect(res.status).toBe(201);
    expect(res.body.tank).toMatchObject({ name, volumeLitres: 18.93, targetSite: { id: site.id, name: site.name, salinityPpt: 28 }, latestReading: null, treeCount: 0 });
    const id = res.body.tank.id;
    await buildTree(t.db, { tankId: id });
    await buildTree(t.db, { tankId: id });
    await buildReading(t.db, id, 12, new Date(Date.now() - 86_400_000));
    await buildReading(t.db, id, 14, new Date(Date.now() - 3_600_000));
    const list = await volunteer.agent.get('/api/tanks');
    expect(list.status).toBe(200);
    expect(list.body.tanks.find((x: { id: string }) => x.id === id)).toMatchObject({ treeCount: 2, latestReading: { salinityPpt: 14, method: 'refractometer' } });
  });

  it.each([
    [{ volumeLitres: 0 }, 'volumeLitres'],
    [{ name: '' }, 'name'],
    [{ targetSiteId: NO_ID }, 'targetSiteId'],
  ])('rejects %j with 400 on that field and stores nothing', async (override, field) => {
    const name = uniqueName('Rejected');
    const res = await staff.agent.post('/api/tanks').set('X-CSRF-Token', staff.token).send({ name, volumeLitres: 20, ...override });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect(await t.db.getRepository(Tank).countBy({ name })).toBe(0);
  });

  it('answers 409 for a name in use, whatever its case', async () => {
    const tank = await buildTank(t.db);
    const res = await staff.agent.post('/api/tanks').set('X-CSRF-Token', staff.token).send({ name: tank.name.toUpperCase(), volumeLitres: 20 });
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('name');
  });

  it('refuses volunteers', async () => {
    expect((await volunteer.agent.post('/api/tanks').set('X-CSRF-Token', volunteer.token).send({ name: uniqueName('V'), volumeLitres: 20 })).status).toBe(403);
  });
});

describe('PATCH /api/tanks/:id', () => {
  it('changes the given fields only', async () => {
    const tank = await buildTank(t.db, { notes: 'keep me' });
    const res = await staff.agent.patch(`/api/tanks/${tank.id}`).set('X-CSRF-Token', staff.token).send({ volumeLitres: 40 });
    expect(res.status).toBe(200);
    expect(res.body.tank).toMatchObject({ name: tank.name, volumeLitres: 40, notes: 'keep me' });
  });

  it('answers 404 for an unknown tank', async () => {
    expect((await staff.agent.patch(`/api/tanks/${NO_ID}`).set('X-CSRF-Token', staff.token).send({ notes: 'x' })).status).toBe(404);
  });
});

describe('POST /api/tanks/:id/readings', () => {
  it('stores a refractometer reading in ppt', async () => {
    const tank = await buildTank(t.db);
    const res = await addReading(tank.id, { salinityPpt: 24.5, note: 'after swap' });
    expect(res.status).toBe(201);
    expect(res.body.reading).toMatchObject({ tankId: tank.id, method: 'refractometer', salinityPpt: 24.5, specificGravity: null, temperatureC: null, note: 'after swap', takenById: staff.user.id });
  });

  // EOS-80 (UNESCO 1981 one-atmosphere equation of state, Millero & Poisson 1981), checked in
  // TRADE.md §4: SG 1.0150 (t/t) at 25 °C ↔ S 19.9, and S 35 at 25 °C ↔ SG 1.02637 (published
  // hydrometer tables give 1.0264); TEOS-10 (python3-gsw) agrees.
  it.each([
    [1.015, 25, 19.9],
    [1.02637, 25, 35],
  ])('converts a hydrometer reading of SG %s at %s °C to %s ppt (EOS-80)', async (specificGravity, temperatureC, ppt) => {
    const tank = await buildTank(t.db);
    const res = await addReading(tank.id, { specificGravity, temperatureC });
    expect(res.status).toBe(201);
    expect(res.body.reading).toMatchObject({ method: 'hydrometer', specificGravity, temperatureC, salinityPpt: ppt });
    const stored = await t.db.getRepository(SalinityReading).findOneByOrFail({ id: res.body.reading.id });
    expect(stored.salinityPpt).toBe(ppt);
  });

  it.each([
    [{ specificGravity: 1.2, temperatureC: 25 }, 'specificGravity'],
    [{ specificGravity: 1.015, temperatureC: 55 }, 'temperatureC'],
    [{ specificGravity: 1.015 }, 'temperatureC'],
    [{ salinityPpt: 50 }, 'salinityPpt'],
    [{ salinityPpt: 30, specificGravity: 1.02 }, 'salinityPpt'],
    [{}, 'salinityPpt'],
    [{ salinityPpt: 30, takenAt: '2999-01-01T00:00:00Z' }, 'takenAt'],
  ])('rejects %j with 400 on that field and stores nothing', async (body, field) => {
    const tank = await buildTank(t.db);
    const res = await addReading(tank.id, body);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect(await t.db.getRepository(SalinityReading).countBy({ tankId: tank.id })).toBe(0);
  });

  it('answers 404 for an unknown tank', async () => {
    expect((await addReading(NO_ID, { salinityPpt: 20 })).status).toBe(404);
  });
});

describe('GET /api/tanks/:id/readings', () => {
  it('lists readings newest first', async () => {
    const tank = await buildTank(t.db);
    await addReading(tank.id, { salinityPpt: 10, takenAt: '2026-05-01T12:00:00Z' }).expect(201);
    await addReading(tank.id, { salinityPpt: 15, takenAt: '2026-05-05T12:00:00Z' }).expect(201);
    await addReading(tank.id, { salinityPpt: 12, takenAt: '2026-05-03T12:00:00Z' }).expect(201);
    const res = await volunteer.agent.get(`/api/tanks/${tank.id}/readings`);
    expect(res.status).toBe(200);
    expect(res.body.readings.map((r: { salinityPpt: number }) => r.salinityPpt)).toEqual([15, 12, 10]);
  });
});
