import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Workday } from '../../server/db/entities/workday.entity.js';
import { buildSite } from '../factories/site.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('workday lifecycle', () => {
  it('creates a draft with role caps, publishes it for the public and completes it', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const site = await buildSite(t.db);
    const body = {
      title: 'Saturday planting', kind: 'planting', siteId: site.id, startsAt: '2027-03-06T13:00:00Z', endsAt: '2027-03-06T17:00:00Z',
      capacity: 8, roles: [{ role: 'seat', capacity: 4 }, { role: 'shore', capacity: 4 }], whatToBring: 'Water, hat, closed shoes', minimumAge: 10,
    };
    const created = await agent.post('/api/workdays').set('X-CSRF-Token', token).send(body);
    expect(created.status).toBe(201);
    expect(created.body.workday).toMatchObject({ status: 'draft', capacity: 8, roleCapped: true, meetingPoint: site.launchName, roles: [{ role: 'seat', capacity: 4, confirmed: 0 }, { role: 'shore', capacity: 4, confirmed: 0 }] });
    const id = created.body.workday.id as string;
    expect((await request(t.app).get(`/api/workdays/${id}`)).status).toBe(404);

    expect((await agent.post(`/api/workdays/${id}/publish`).set('X-CSRF-Token', token)).body.workday.status).toBe('published');
    const pub = await request(t.app).get(`/api/workdays/${id}`);
    expect(pub.status).toBe(200);
    expect(pub.body.workday).toMatchObject({ title: 'Saturday planting', site: { id: site.id, name: site.name } });
    const list = await request(t.app).get('/api/workdays').query({ siteId: site.id });
    expect(list.body.workdays.map((w: { id: string }) => w.id)).toEqual([id]);

    expect((await agent.post(`/api/workdays/${id}/publish`).set('X-CSRF-Token', token)).status).toBe(409);
    expect((await agent.post(`/api/workdays/${id}/complete`).set('X-CSRF-Token', token)).body.workday.status).toBe('completed');
  });

  it("gives anyone the tide of a public workday's local day, but not of a draft", async () => {
    const w = await buildWorkday(t.db, { startsAt: new Date('2027-01-09T15:00:00Z'), endsAt: new Date('2027-01-09T18:00:00Z') });
    const res = await request(t.app).get(`/api/workdays/${w.id}/tide`).query({ units: 'ft' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ units: 'ft', datum: 'MLLW', station: { id: 'noaa/8726738' } });
    expect(res.body).not.toHaveProperty('site');
    // 9 January 2027 in New York (EST, UTC−5): local midnight is 05:00Z.
    expect(res.body.levels[0].time).toBe('2027-01-09T05:00:00.000Z');
    expect(res.body.levels.at(-1).time).toBe('2027-01-10T05:00:00.000Z');
    for (const e of res.body.extremes as { time: string }[]) expect(e.time >= '2027-01-09T05:00' && e.time <= '2027-01-10T05:00').toBe(true);
    const draft = await buildWorkday(t.db, { status: 'draft' });
    expect((await request(t.app).get(`/api/workdays/${draft.id}/tide`)).status).toBe(404);
  });

  it('keeps drafts out of the public list', async () => {
    const draft = await buildWorkday(t.db, { status: 'draft' });
    const anon = await request(t.app).get('/api/workdays').query({ siteId: draft.siteId });
    expect(anon.body.workdays).toEqual([]);
    const { agent } = await authAgentFor(t, 'coordinator');
    const staff = await agent.get('/api/workdays').query({ siteId: draft.siteId, status: 'draft' });
    expect(staff.body.workdays.map((w: { id: string }) => w.id)).toEqual([draft.id]);
  });

  it('raises the calendar sequence when the time moves', async () => {
    const w = await buildWorkday(t.db);
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const later = new Date(w.startsAt.getTime() + 3_600_000).toISOString();
    const laterEnd = new Date(w.endsAt.getTime() + 3_600_000).toISOString();
    const res = await agent.patch(`/api/workdays/${w.id}`).set('X-CSRF-Token', token).send({ startsAt: later, endsAt: laterEnd });
    expect(res.status).toBe(200);
    expect(res.body.workday.startsAt).toBe(later);
    expect((await t.db.getRepository(Workday).findOneByOrFail({ id: w.id })).sequence).toBe(w.sequence + 1);
    await agent.patch(`/api/workdays/${w.id}`).set('X-CSRF-Token', token).send({ description: 'Bring gloves' }).expect(200);
    expect((await t.db.getRepository(Workday).findOneByOrFail({ id: w.id })).sequence).toBe(w.sequence + 1);
  });

  it('cancels with a message for the crew, and refuses to cancel twice', async () => {
    const w = await buildWorkday(t.db);
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const noMessage = await agent.post(`/api/workdays/${w.id}/cancel`).set('X-CSRF-Token', token).send({});
    expect(noMessage.status).toBe(400);
    const res = await agent.post(`/api/workdays/${w.id}/cancel`).set('X-CSRF-Token', token).send({ message: 'Small craft advisory on the bay.' });
    expect(res.body.workday).toMatchObject({ status: 'cancelled', cancelMessage: 'Small craft advisory on the bay.' });
    expect((await agent.post(`/api/workdays/${w.id}/cancel`).set('X-CSRF-Token', token).send({ message: 'again' })).status).toBe(409);
  });

  it.each([
    [{ endsAt: '2027-03-06T12:00:00Z' }, 'endsAt'],
    [{ capacity: 0 }, 'capacity'],
    [{ roles: [{ role: 'seat', capacity: 1 }, { role: 'seat', capacity: 2 }] }, 'roles'],
    [{ roles: [{ role: 'captain', capacity: 1 }] }, 'roles.0.role'],
  ])('rejects %j with 400', async (override, field) => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const site = await buildSite(t.db);
    const res = await agent.post('/api/workdays').set('X-CSRF-Token', token).send({ siteId: site.id, startsAt: '2027-03-06T13:00:00Z', endsAt: '2027-03-06T17:00:00Z', ...override });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect(await t.db.getRepository(Workday).countBy({ siteId: site.id })).toBe(0);
  });
});
