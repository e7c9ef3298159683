import { describe, expect, it } from 'vitest';
import { http, HttpResponse } from 'msw';
import { z } from 'zod';
import { ApiError, get, post } from '@/api/http';
import { CSRF_TOKEN, server } from '../../setup/client-setup';

const Ok = z.object({ ok: z.boolean() });

describe('http', () => {
  it('sends the CSRF token from /api/auth/csrf on a POST, with same-origin credentials', async () => {
    let seen: { token: string | null; credentials: string; body: unknown } | undefined;
    server.use(
      http.post('/api/things', async ({ request }) => {
        seen = { token: request.headers.get('X-CSRF-Token'), credentials: request.credentials, body: await request.json() };
        return HttpResponse.json({ ok: true }, { status: 201 });
      }),
    );

    await expect(post('/api/things', { a: 1 }, Ok)).resolves.toEqual({ ok: true });
    expect(seen).toEqual({ token: CSRF_TOKEN, credentials: 'same-origin', body: { a: 1 } });
  });

  it('fetches the CSRF token once and reuses it', async () => {
    let csrfCalls = 0;
    server.use(
      http.get('/api/auth/csrf', () => {
        csrfCalls += 1;
        return HttpResponse.json({ token: 'once' });
      }),
      http.post('/api/things', () => new HttpResponse(null, { status: 204 })),
    );

    await post('/api/things', {});
    await post('/api/things', {});
    expect(csrfCalls).toBe(1);
  });

  it('does not send a CSRF token on GET', async () => {
    let token: string | null = 'unset';
    server.use(
      http.get('/api/things', ({ request }) => {
        token = request.headers.get('X-CSRF-Token');
        return HttpResponse.json({ ok: true });
      }),
    );

    await get('/api/things', Ok);
    expect(token).toBeNull();
  });

  it('throws ApiError with the code, message and fields of an ErrorBody', async () => {
    server.use(
      http.post('/api/things', () =>
        HttpResponse.json(
          { error: { code: 'validation_failed', message: 'Thing is invalid', fields: { name: ['is required'] } } },
          { status: 400 },
        ),
      ),
    );

    const err = await post('/api/things', {}).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect(err).toMatchObject({ status: 400, code: 'validation_failed', message: 'Thing is invalid', fields: { name: ['is required'] } });
  });

  it('turns a non-JSON failure into internal_error', async () => {
    server.use(http.get('/api/things', () => new HttpResponse('<html>Bad gateway</html>', { status: 502 })));

    await expect(get('/api/things', Ok)).rejects.toMatchObject({ status: 502, code: 'internal_error' });
  });

  it('refetches the token and retries once after a 403 csrf_failed', async () => {
    const tokens = ['stale', 'fresh'];
    const sent: (string | null)[] = [];
    server.use(
      http.get('/api/auth/csrf', () => HttpResponse.json({ token: tokens.shift() ?? 'none' })),
      http.post('/api/things', ({ request }) => {
        const token = request.headers.get('X-CSRF-Token');
        sent.push(token);
        if (token === 'fresh') return HttpResponse.json({ ok: true });
        return HttpResponse.json({ error: { code: 'csrf_failed', message: 'Bad token' } }, { status: 403 });
      }),
    );

    await expect(post('/api/things', {}, Ok)).resolves.toEqual({ ok: true });
    expect(sent).toEqual(['stale', 'fresh']);
  });

  it('does not retry a 403 that is not about CSRF', async () => {
    let calls = 0;
    server.use(
      http.post('/api/things', () => {
        calls += 1;
        return HttpResponse.json({ error: { code: 'forbidden', message: 'Admins only' } }, { status: 403 });
      }),
    );

    await expect(post('/api/things', {})).rejects.toMatchObject({ status: 403, code: 'forbidden' });
    expect(calls).toBe(1);
  });
});
