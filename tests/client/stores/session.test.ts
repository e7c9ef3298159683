import { beforeEach, describe, expect, it } from 'vitest';
import { http, HttpResponse } from 'msw';
import { createPinia, setActivePinia } from 'pinia';
import { useSessionStore } from '@/stores/session';
import { CSRF_TOKEN, server } from '../../setup/client-setup';
import { mockMe } from '../support/msw';
import { buildUser } from '../support/users';

describe('useSessionStore', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('load() keeps the signed-in user and the role helpers follow it', async () => {
    const user = buildUser({ role: 'coordinator' });
    mockMe(user);
    const session = useSessionStore();

    await session.load();

    expect(session.loaded).toBe(true);
    expect(session.user).toEqual(user);
    expect(session.isSignedIn).toBe(true);
    expect(session.isCoordinator).toBe(true);
    expect(session.isAdmin).toBe(false);
    expect(session.hasRole(['coordinator', 'admin'])).toBe(true);
  });

  it('load() treats 401 as signed out, without an error', async () => {
    mockMe(null);
    const session = useSessionStore();

    await session.load();

    expect(session).toMatchObject({ loaded: true, user: null, isSignedIn: false, loadError: null });
  });

  it('load() reports an unreachable server instead of pretending all is well', async () => {
    server.use(http.get('/api/auth/me', () => new HttpResponse('upstream down', { status: 502 })));
    const session = useSessionStore();

    await session.load();

    expect(session.user).toBeNull();
    expect(session.loaded).toBe(true);
    expect(session.loadError).toMatch(/HTTP 502/);
  });

  it('login() posts the credentials with the CSRF token and keeps the user', async () => {
    const user = buildUser({ role: 'admin' });
    let received: { body: unknown; token: string | null } | undefined;
    server.use(
      http.post('/api/auth/login', async ({ request }) => {
        received = { body: await request.json(), token: request.headers.get('X-CSRF-Token') };
        return HttpResponse.json({ user });
      }),
    );
    const session = useSessionStore();

    await session.login({ email: user.email, password: 'correct horse battery' });

    expect(received).toEqual({ body: { email: user.email, password: 'correct horse battery' }, token: CSRF_TOKEN });
    expect(session.user).toEqual(user);
    expect(session.isAdmin).toBe(true);
  });

  it('login() rejects with the API error and stays signed out on 401', async () => {
    server.use(
      http.post('/api/auth/login', () =>
        HttpResponse.json({ error: { code: 'invalid_credentials', message: 'E-mail or password is wrong' } }, { status: 401 }),
      ),
    );
    const session = useSessionStore();

    await expect(session.login({ email: 'a@example.test', password: 'nope-nope' })).rejects.toMatchObject({
      code: 'invalid_credentials',
    });
    expect(session.user).toBeNull();
  });

  it('logout() clears the user and fetches a fresh CSRF token for the next session', async () => {
    const tokens: (string | null)[] = [];
    let csrfCalls = 0;
    server.use(
      http.get('/api/auth/csrf', () => HttpResponse.json({ token: `t${++csrfCalls}` })),
      http.post('/api/auth/logout', ({ request }) => {
        tokens.push(request.headers.get('X-CSRF-Token'));
        return new HttpResponse(null, { status: 204 });
      }),
    );
    mockMe(buildUser());
    const session = useSessionStore();
    await session.load();

    await session.logout();
    await session.logout();

    expect(session.user).toBeNull();
    expect(session.isSignedIn).toBe(false);
    expect(tokens).toEqual(['t1', 't2']);
  });
});
