import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  // Settings are organisation-wide: change them only in a database of this file's own.
  t = await createTestApp({ ownDatabase: 'organisation' });
});
afterAll(() => t.close());

describe('GET /api/organisation', () => {
  it('tells anyone the name, units, time zone and whether it is demo data, nothing private', async () => {
    const res = await request(t.app).get('/api/organisation');
    expect(res.status).toBe(200);
    expect(res.body.organisation).toEqual({ name: expect.any(String), isDemo: expect.any(Boolean), units: expect.stringMatching(/^(ft|m)$/), timeZone: expect.any(String), currency: 'usd' });
  });
});

describe('PATCH /api/organisation/settings', () => {
  it('lets an admin change receipt details and units', async () => {
    const { agent, token } = await authAgentFor(t, 'admin');
    const res = await agent.patch('/api/organisation/settings').set('X-CSRF-Token', token).send({ legalName: 'Shoreline Test Org, Inc.', taxId: '12-3456789', units: 'm' });
    expect(res.status).toBe(200);
    expect(res.body.settings).toMatchObject({ legalName: 'Shoreline Test Org, Inc.', taxId: '12-3456789', units: 'm' });
    expect((await agent.get('/api/organisation/settings')).body.settings).toMatchObject({ units: 'm' });
    await agent.patch('/api/organisation/settings').set('X-CSRF-Token', token).send({ units: 'ft' }).expect(200);
  });

  it('lets an admin set the readiness rules and the window weights', async () => {
    const { agent, token } = await authAgentFor(t, 'admin');
    const nurseryRules = { crownRule: 'share', maxCrownSubmergedShare: 0.05, salinityTolerancePpt: 3, holdDays: 28 };
    const windowWeights = { duration: 0.5, lowWater: 0.1, weekend: 0.3, startHour: 0.1 };
    const res = await agent.patch('/api/organisation/settings').set('X-CSRF-Token', token).send({ nurseryRules, windowWeights });
    expect(res.status).toBe(200);
    expect(res.body.settings).toMatchObject({ nurseryRules, windowWeights });
    await agent.patch('/api/organisation/settings').set('X-CSRF-Token', token)
      .send({ nurseryRules: { crownRule: 'mhhw', maxCrownSubmergedShare: 0.02, salinityTolerancePpt: 2, holdDays: 21 }, windowWeights: { duration: 0.4, lowWater: 0.2, weekend: 0.25, startHour: 0.15 } })
      .expect(200);
  });

  it.each([
    [{ windowWeights: { duration: 0, lowWater: 0, weekend: 0, startHour: 0 } }, 'windowWeights'],
    [{ nurseryRules: { crownRule: 'moon', maxCrownSubmergedShare: 0.02, salinityTolerancePpt: 2, holdDays: 21 } }, 'nurseryRules.crownRule'],
    [{ timeZone: 'Mars/Olympus' }, 'timeZone'],
    [{ units: 'fathoms' }, 'units'],
    [{ name: '' }, 'name'],
    [{ isDemo: false }, '_'],
  ])('rejects %j with 400 and changes nothing', async (body, field) => {
    const { agent, token } = await authAgentFor(t, 'admin');
    const before = (await agent.get('/api/organisation/settings')).body.settings;
    const res = await agent.patch('/api/organisation/settings').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toContain(field);
    expect((await agent.get('/api/organisation/settings')).body.settings).toEqual(before);
  });
});
