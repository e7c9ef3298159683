import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { User } from '../../server/db/entities/user.entity.js';
import { buildUser, TEST_PASSWORD } from '../factories/user.factory.js';
import { authAgentFor, createTestApp, csrfAgent, mailTo, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const tokenFrom = (text: string, path: string) => new RegExp(`${path}\\?token=([\\w-]+)`).exec(text)?.[1];

describe('password reset by e-mail', () => {
  it('mails a one-time link that sets a new password and signs other sessions out', async () => {
    const user = await buildUser(t.db);
    const other = await csrfAgent(t.app);
    await other.agent.post('/api/auth/login').set('X-CSRF-Token', other.token).send({ email: user.email, password: TEST_PASSWORD }).expect(200);

    const { agent, token } = await csrfAgent(t.app);
    const asked = await agent.post('/api/auth/password-reset/request').set('X-CSRF-Token', token).send({ email: user.email });
    expect(asked.status).toBe(202);
    const [mail] = await mailTo(t.config, user.email);
    expect(mail?.subject).toBe('Reset your Ebbroot password');
    const resetToken = tokenFrom(mail?.text ?? '', '/reset-password');
    expect(resetToken).toBeDefined();

    const done = await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', token).send({ token: resetToken, password: 'a brand new phrase' });
    expect(done.status).toBe(204);
    expect((await other.agent.get('/api/auth/me')).status).toBe(401);

    const oldLogin = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email: user.email, password: TEST_PASSWORD });
    expect(oldLogin.status).toBe(401);
    const newLogin = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email: user.email, password: 'a brand new phrase' });
    expect(newLogin.status).toBe(200);

    const fresh = (await agent.get('/api/auth/csrf')).body.token as string;
    const again = await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', fresh).send({ token: resetToken, password: 'yet another phrase' });
    expect(again.status).toBe(400);
    expect(ErrorBody.parse(again.body).error.code).toBe('invalid_token');
  });

  it('answers the same for an unknown e-mail and sends nothing', async () => {
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/password-reset/request').set('X-CSRF-Token', token).send({ email: 'nobody.here@test.ebbroot.test' });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ ok: true });
    expect(await mailTo(t.config, 'nobody.here@test.ebbroot.test')).toHaveLength(0);
  });

  it('rejects a made-up token', async () => {
    const { agent, token } = await csrfAgent(t.app);
    const res = await agent.post('/api/auth/password-reset/confirm').set('X-CSRF-Token', token).send({ token: 'x'.repeat(43), password: 'whatever phrase' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.code).toBe('invalid_token');
  });
});

describe('e-mail verification', () => {
  it('marks the account verified from the mailed link, once', async () => {
    const { agent, token, user } = await authAgentFor(t, 'volunteer');
    expect((await agent.post('/api/auth/verify-email/resend').set('X-CSRF-Token', token)).status).toBe(202);
    const [mail] = await mailTo(t.config, user.email);
    const verifyToken = tokenFrom(mail?.text ?? '', '/verify-email');
    const res = await agent.post('/api/auth/verify-email').set('X-CSRF-Token', token).send({ token: verifyToken });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ user: { id: user.id, emailVerified: true } });
    expect((await t.db.getRepository(User).findOneByOrFail({ id: user.id })).emailVerifiedAt).toBeInstanceOf(Date);
    const twice = await agent.post('/api/auth/verify-email').set('X-CSRF-Token', token).send({ token: verifyToken });
    expect(twice.status).toBe(400);
  });
});
