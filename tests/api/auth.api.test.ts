import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { User } from '../../server/db/entities/user.entity.js';
import { buildUser, TEST_PASSWORD, uniqueEmail } from '../factories/user.factory.js';
import { createTestApp, csrfAgent, mailTo, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const sessionCookie = (res: request.Response) =>
  ([] as string[]).concat(res.headers['set-cookie'] ?? []).find((c) => c.startsWith('ebbroot.sid='))?.split(';')[0];

describe('POST /api/auth/register', () => {
  it('creates a volunteer, signs them in and sends a verification e-mail', async () => {
    const { agent, token } = await csrfAgent(t.app);
    const email = uniqueEmail('new');
    const res = await agent.post('/api/auth/register').set('X-CSRF-Token', token).send({ name: 'Rin Harbor', email: email.toUpperCase(), password: 'mangrove roots' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ user: { name: 'Rin Harbor', email, role: 'volunteer', emailVerified: false } });
    expect(res.body.user).not.toHaveProperty('passwordHash');
    const me = await agent.get('/api/auth/me');
    expect(me.body).toMatchObject({ user: { email } });
    const stored = await t.db.getRepository(User).findOneByOrFail({ email });
    expect(stored.passwordHash).toMatch(/^scrypt\$/);
    expect(stored.passwordHash).not.toContain('mangrove roots');
    const mails = await mailTo(t.config, email);
    expect(mails[0]?.subject).toBe('Confirm your e-mail for Ebbroot');
    expect(mails[0]?.text).toContain('/verify-email?token=');
  });

  it('rejects a taken e-mail with 409 and changes nothing', async () => {
    const existing = await buildUser(t.db);
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/register').set('X-CSRF-Token', token).send({ name: 'Other', email: existing.email, password: 'another password' });
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'conflict', fields: { email: ['is already registered'] } });
    expect(await t.db.getRepository(User).countBy({ email: existing.email })).toBe(1);
  });

  it.each([
    [{ name: '', email: 'a@b.test', password: 'longenough' }, 'name'],
    [{ name: 'X', email: 'not-an-email', password: 'longenough' }, 'email'],
    [{ name: 'X', email: 'a@b.test', password: 'short' }, 'password'],
  ])('answers 400 with the failing field for %j', async (body, field) => {
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/register').set('X-CSRF-Token', token).send(body);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect(await t.db.getRepository(User).countBy({ email: 'a@b.test' })).toBe(0);
  });
});

describe('POST /api/auth/login and logout', () => {
  it('signs in with a new session id and signs out', async () => {
    const user = await buildUser(t.db, { role: 'coordinator' });
    const { agent, token } = await csrfAgent(t.app);
    const before = await agent.get('/api/auth/csrf');
    const login = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email: user.email, password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    expect(login.body).toEqual({ user: { id: user.id, name: user.name, email: user.email, role: 'coordinator', emailVerified: false } });
    const cookie = sessionCookie(login);
    expect(cookie).toBeDefined();
    expect(cookie).not.toBe(sessionCookie(before));
    expect(login.headers['set-cookie']?.[0]).toMatch(/HttpOnly/i);
    expect(login.headers['set-cookie']?.[0]).toMatch(/SameSite=Lax/i);
    const fresh = (await agent.get('/api/auth/csrf')).body.token as string;
    expect((await agent.post('/api/auth/logout').set('X-CSRF-Token', fresh)).status).toBe(204);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('answers a wrong password with 401 invalid_credentials', async () => {
    const user = await buildUser(t.db);
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email: user.email, password: 'wrong password' });
    expect(res.status).toBe(401);
    expect(ErrorBody.parse(res.body).error.code).toBe('invalid_credentials');
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('answers GET /api/auth/me with 401 when signed out', async () => {
    const res = await request(t.app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(ErrorBody.parse(res.body).error.code).toBe('unauthenticated');
  });
});

describe('CSRF protection', () => {
  it('refuses a state-changing request with a session cookie but no token', async () => {
    const user = await buildUser(t.db);
    const { agent } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(ErrorBody.parse(res.body).error.code).toBe('csrf_failed');
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('refuses a token from another session', async () => {
    const a = await csrfAgent(t.app);
    const b = await csrfAgent(t.app);
    const user = await buildUser(t.db);
    const res = await a.agent.post('/api/auth/login').set('X-CSRF-Token', b.token).send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
  });
});
