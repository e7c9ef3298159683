import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { buildUser, TEST_PASSWORD } from '../factories/user.factory.js';
import { createTestApp, csrfAgent, type TestApp } from '../setup/test-app.js';

// Each test gets its own app, so counters start from zero.
let t: TestApp;
beforeEach(async () => {
  t = await createTestApp();
});
afterEach(() => t.close());

async function attempt(email: string, password: string) {
  const { agent, token } = await csrfAgent(t.app);
  return agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email, password });
}

describe('sign-in rate limits', () => {
  it('answers 429 after 10 failed attempts on one account, even with the right password', async () => {
    const user = await buildUser(t.db);
    for (let i = 0; i < 10; i++) expect((await attempt(user.email, `wrong ${i}`)).status).toBe(401);
    const blocked = await attempt(user.email, TEST_PASSWORD);
    expect(blocked.status).toBe(429);
    expect(ErrorBody.parse(blocked.body).error.code).toBe('rate_limited');
  });

  it('does not count successful sign-ins', async () => {
    const user = await buildUser(t.db);
    for (let i = 0; i < 9; i++) await attempt(user.email, 'wrong password');
    for (let i = 0; i < 5; i++) expect((await attempt(user.email, TEST_PASSWORD)).status).toBe(200);
    expect((await attempt(user.email, 'wrong again')).status).toBe(401);
    expect((await attempt(user.email, TEST_PASSWORD)).status).toBe(429);
  });

  it('limits failures per address across accounts', async () => {
    for (let i = 0; i < 10; i++) {
      const u = await buildUser(t.db);
      await attempt(u.email, 'wrong password');
    }
    const fresh = await buildUser(t.db);
    expect((await attempt(fresh.email, TEST_PASSWORD)).status).toBe(429);
  });
});

describe('registration rate limit', () => {
  it('allows 100 registrations an hour from one address, then answers 429', async () => {
    const { agent, token } = await csrfAgent(t.app);
    const bad = { name: '', email: 'x', password: '' };
    for (let i = 0; i < 100; i++) await agent.post('/api/auth/register').set('X-CSRF-Token', token).send(bad);
    const res = await agent.post('/api/auth/register').set('X-CSRF-Token', token).send(bad);
    expect(res.status).toBe(429);
  });
});
