import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { User } from '../../server/db/entities/user.entity.js';
import { buildUser } from '../factories/user.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('GET /api/users', () => {
  it('lists accounts with role and verified flag for an admin, filtered by q', async () => {
    const { agent } = await authAgentFor(t, 'admin');
    const target = await buildUser(t.db, { name: 'Quillon Searchable', emailVerifiedAt: new Date() });
    const res = await agent.get('/api/users').query({ q: 'quillon' });
    expect(res.status).toBe(200);
    expect(res.body.users).toEqual([
      expect.objectContaining({ id: target.id, name: 'Quillon Searchable', role: 'volunteer', emailVerified: true }),
    ]);
    expect(res.body.users[0]).not.toHaveProperty('passwordHash');
  });

  it('rejects an unknown role filter with 400', async () => {
    const { agent } = await authAgentFor(t, 'admin');
    const res = await agent.get('/api/users').query({ role: 'captain' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('role');
  });
});

describe('PATCH /api/users/:id/role', () => {
  it('lets an admin make a volunteer a coordinator', async () => {
    const { agent, token } = await authAgentFor(t, 'admin');
    const target = await buildUser(t.db);
    const res = await agent.patch(`/api/users/${target.id}/role`).set('X-CSRF-Token', token).send({ role: 'coordinator' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ user: { id: target.id, role: 'coordinator' } });
    expect((await t.db.getRepository(User).findOneByOrFail({ id: target.id })).role).toBe('coordinator');
  });

  it('answers 404 for an unknown user and 400 for a bad id or role', async () => {
    const { agent, token } = await authAgentFor(t, 'admin');
    const unknown = await agent.patch('/api/users/00000000-0000-4000-8000-000000000000/role').set('X-CSRF-Token', token).send({ role: 'admin' });
    expect(unknown.status).toBe(404);
    expect((await agent.patch('/api/users/not-a-uuid/role').set('X-CSRF-Token', token).send({ role: 'admin' })).status).toBe(400);
    const target = await buildUser(t.db);
    expect((await agent.patch(`/api/users/${target.id}/role`).set('X-CSRF-Token', token).send({ role: 'captain' })).status).toBe(400);
    expect((await t.db.getRepository(User).findOneByOrFail({ id: target.id })).role).toBe('volunteer');
  });

  it('refuses an admin changing their own role, so the last admin cannot be demoted', async () => {
    const { agent, token, user } = await authAgentFor(t, 'admin');
    const res = await agent.patch(`/api/users/${user.id}/role`).set('X-CSRF-Token', token).send({ role: 'volunteer' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('role');
    expect((await t.db.getRepository(User).findOneByOrFail({ id: user.id })).role).toBe('admin');
  });
});

describe('GET /api/volunteers', () => {
  it('shows coordinators which volunteers have confirmed their e-mail', async () => {
    const { agent } = await authAgentFor(t, 'coordinator');
    const a = await buildUser(t.db, { name: 'Verity Confirmed', emailVerifiedAt: new Date() });
    const b = await buildUser(t.db, { name: 'Verity Pending' });
    const res = await agent.get('/api/volunteers').query({ q: 'verity' });
    expect(res.status).toBe(200);
    const byId = new Map((res.body.users as { id: string; emailVerified: boolean }[]).map((u) => [u.id, u.emailVerified]));
    expect(byId.get(a.id)).toBe(true);
    expect(byId.get(b.id)).toBe(false);
  });
});
