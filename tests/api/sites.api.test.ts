import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Site } from '../../server/db/entities/site.entity.js';
import { siteBody } from '../factories/site.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('POST /api/sites', () => {
  it('lets a coordinator create a site that everyone signed in can read', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const body = siteBody();
    const res = await agent.post('/api/sites').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(201);
    expect(res.body.site).toMatchObject({ ...body, id: expect.any(String), minWindowMinutes: 120, includeCivilTwilight: false });
    const volunteer = await authAgentFor(t, 'volunteer');
    const read = await volunteer.agent.get(`/api/sites/${res.body.site.id}`);
    expect(read.status).toBe(200);
    expect(read.body.site.name).toBe(body.name);
    expect((await volunteer.agent.get('/api/sites')).body.sites.map((s: { id: string }) => s.id)).toContain(res.body.site.id);
  });

  it('refuses volunteers', async () => {
    const { agent, token } = await authAgentFor(t, 'volunteer');
    expect((await agent.post('/api/sites').set('X-CSRF-Token', token).send(siteBody())).status).toBe(403);
  });

  it.each([
    [{ latitude: 91 }, 'latitude'],
    [{ timeZone: 'Tampa' }, 'timeZone'],
    [{ stationId: 'not a station' }, 'stationId'],
    [{ workingDepthM: -1 }, 'workingDepthM'],
    [{ name: '' }, 'name'],
  ])('rejects %j with 400 on that field and stores nothing', async (override, field) => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const body = siteBody(override as never);
    const res = await agent.post('/api/sites').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect(await t.db.getRepository(Site).countBy({ name: body.name })).toBe(0);
  });

  it('rejects a station that is not in the tide dataset', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const res = await agent.post('/api/sites').set('X-CSRF-Token', token).send(siteBody({ stationId: 'noaa/0000000' }));
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('stationId');
  });

  it('answers 409 for a name already used', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const body = siteBody();
    await agent.post('/api/sites').set('X-CSRF-Token', token).send(body).expect(201);
    const res = await agent.post('/api/sites').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('name');
  });
});

describe('PATCH /api/sites/:id', () => {
  it('updates the given fields only', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const created = (await agent.post('/api/sites').set('X-CSRF-Token', token).send(siteBody())).body.site;
    const res = await agent.patch(`/api/sites/${created.id}`).set('X-CSRF-Token', token).send({ bedElevationM: 0.35, salinityPpt: 27 });
    expect(res.status).toBe(200);
    expect(res.body.site).toMatchObject({ bedElevationM: 0.35, salinityPpt: 27, name: created.name, routeElevationM: created.routeElevationM });
  });

  it('leaves fields it was not sent alone (no defaults creep into a partial update)', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const created = (await agent.post('/api/sites').set('X-CSRF-Token', token).send(siteBody({ workingDepthM: 0.6, salinityPpt: 30, notes: 'keep me' }))).body.site;
    const res = await agent.patch(`/api/sites/${created.id}`).set('X-CSRF-Token', token).send({ name: `${created.name} renamed` });
    expect(res.status).toBe(200);
    expect(res.body.site).toMatchObject({ workingDepthM: 0.6, salinityPpt: 30, notes: 'keep me', launchName: created.launchName });
  });

  it('answers 404 for an unknown site', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    expect((await agent.patch('/api/sites/00000000-0000-4000-8000-000000000000').set('X-CSRF-Token', token).send({ notes: 'x' })).status).toBe(404);
  });
});
