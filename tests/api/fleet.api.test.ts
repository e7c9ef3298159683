import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Craft } from '../../server/db/entities/craft.entity.js';
import { craftBody } from '../factories/craft.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('/api/fleet', () => {
  it('lets a coordinator register, edit and retire a craft that everyone signed in can list', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const body = craftBody();
    const created = await agent.post('/api/fleet').set('X-CSRF-Token', token).send(body);
    expect(created.status).toBe(201);
    expect(created.body.craft).toMatchObject({ ...body, hasCapacityPlate: false, needsOperator: false, active: true, draftM: null, notes: '' });
    const id = created.body.craft.id as string;

    const patched = await agent.patch(`/api/fleet/${id}`).set('X-CSRF-Token', token).send({ seats: 3, notes: 'Green hull' });
    expect(patched.status).toBe(200);
    expect(patched.body.craft).toMatchObject({ seats: 3, notes: 'Green hull', name: body.name });

    const volunteer = await authAgentFor(t, 'volunteer');
    const list = await volunteer.agent.get('/api/fleet').expect(200);
    expect(list.body.craft.find((c: { id: string }) => c.id === id)).toMatchObject({ seats: 3 });

    const retired = await agent.delete(`/api/fleet/${id}`).set('X-CSRF-Token', token);
    expect(retired.status).toBe(200);
    expect(retired.body.craft.active).toBe(false);
    expect((await t.db.getRepository(Craft).findOneByOrFail({ id })).active).toBe(false);
  });

  it('refuses volunteers', async () => {
    const { agent, token } = await authAgentFor(t, 'volunteer');
    expect((await agent.post('/api/fleet').set('X-CSRF-Token', token).send(craftBody())).status).toBe(403);
  });

  it.each([
    [{ kind: 'raft' }, 'kind'],
    [{ seats: 0 }, 'seats'],
    [{ maxLoadKg: -5 }, 'maxLoadKg'],
    [{ name: '' }, 'name'],
  ])('rejects %j with 400 on that field', async (override, field) => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const res = await agent.post('/api/fleet').set('X-CSRF-Token', token).send({ ...craftBody(), ...override });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
  });

  it('answers 409 on a name already used, with fields.name', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const body = craftBody();
    await agent.post('/api/fleet').set('X-CSRF-Token', token).send(body).expect(201);
    const res = await agent.post('/api/fleet').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('name');
    const other = await agent.post('/api/fleet').set('X-CSRF-Token', token).send(craftBody()).expect(201);
    const renamed = await agent.patch(`/api/fleet/${other.body.craft.id}`).set('X-CSRF-Token', token).send({ name: body.name });
    expect(renamed.status).toBe(409);
  });

  it('answers 404 for an unknown craft', async () => {
    const { agent, token } = await authAgentFor(t, 'admin');
    expect((await agent.delete('/api/fleet/00000000-0000-4000-8000-000000000000').set('X-CSRF-Token', token)).status).toBe(404);
  });
});

describe('GET /api/fleet/rule-of-thumb', () => {
  // Boater-education rule of thumb (TRADE.md §1; boat-ed.com study guide "Calculating your
  // boat's capacity"): persons = length × beam / 15, rounded down: 16 × 5 / 15 = 5.33 → 5.
  it('suggests 5 persons for a 16 ft × 5 ft boat and labels it a rule of thumb, not a rating', async () => {
    const { agent } = await authAgentFor(t, 'volunteer');
    const res = await agent.get('/api/fleet/rule-of-thumb?lengthFt=16&beamFt=5');
    expect(res.status).toBe(200);
    expect(res.body.persons).toBe(5);
    expect(res.body.note).toMatch(/rule of thumb/i);
    expect(res.body.note).toMatch(/boat-ed\.com/);
    expect(res.body.note).toMatch(/not a rating/i);
  });

  it('rejects a missing beam', async () => {
    const { agent } = await authAgentFor(t, 'volunteer');
    const res = await agent.get('/api/fleet/rule-of-thumb?lengthFt=16');
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('beamFt');
  });
});
