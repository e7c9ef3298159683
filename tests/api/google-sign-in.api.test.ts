import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/db/entities/user.entity.js';
import { DECIDE_PATH } from '../../fakes/oauth/oauth-pages.js';
import { buildUser, uniqueEmail } from '../factories/user.factory.js';
import { createTestApp, type Agent, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** Walks the OAuth2 dance the way a browser would: app → provider's page → provider's redirect → app. */
async function signInWithGoogle(agent: Agent, choice: Record<string, string>) {
  const start = await agent.get('/api/auth/google');
  expect(start.status).toBe(302);
  const authUrl = new URL(start.headers.location ?? '');
  expect(`${authUrl.origin}${authUrl.pathname}`).toBe(t.config.GOOGLE_AUTH_URL);
  expect(authUrl.searchParams.get('state')).toBeTruthy();
  const form = new URLSearchParams({ ...Object.fromEntries(authUrl.searchParams), ...choice });
  const decided = await fetch(`${authUrl.origin}${DECIDE_PATH}`, { method: 'POST', body: form, redirect: 'manual' });
  expect(decided.status).toBe(302);
  const back = new URL(decided.headers.get('location') ?? '');
  return agent.get(`${back.pathname}${back.search}`);
}

describe('GET /api/auth/google', () => {
  it('creates a verified volunteer from the provider identity and signs them in', async () => {
    const agent = request.agent(t.app);
    const email = uniqueEmail('google');
    const done = await signInWithGoogle(agent, { name: 'Gale Pereira', email });
    expect(done.status).toBe(302);
    expect(done.headers.location).toBe('/');
    const me = await agent.get('/api/auth/me');
    expect(me.body).toMatchObject({ user: { name: 'Gale Pereira', email, role: 'volunteer', emailVerified: true } });
    const again = await signInWithGoogle(request.agent(t.app), { name: 'Gale Pereira', email });
    expect(again.headers.location).toBe('/');
    expect(await t.db.getRepository(User).countBy({ email })).toBe(1);
  });

  it('links to an existing password account with the same e-mail', async () => {
    const existing = await buildUser(t.db, { role: 'coordinator' });
    const agent = request.agent(t.app);
    await signInWithGoogle(agent, { name: 'Whoever', email: existing.email });
    const me = await agent.get('/api/auth/me');
    expect(me.body).toMatchObject({ user: { id: existing.id, role: 'coordinator', emailVerified: true } });
    expect((await t.db.getRepository(User).findOneByOrFail({ id: existing.id })).googleId).toMatch(/^\d+$/);
  });

  it('sends the user back to sign-in when they cancel at the provider', async () => {
    const agent = request.agent(t.app);
    const res = await signInWithGoogle(agent, { decision: 'cancel' });
    expect(res.status).toBe(302);
    expect(res.headers.location).toBe('/login?error=google');
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('refuses a callback whose state does not match the session', async () => {
    const agent = request.agent(t.app);
    await agent.get('/api/auth/google');
    const res = await agent.get('/api/auth/google/callback?code=forged&state=forged');
    expect(res.status).toBe(302);
    expect(res.headers.location).toBe('/login?error=google');
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });
});
