import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';
import { authParams, CALLBACK, CLIENT_ID, CLIENT_SECRET, decide, exchange, signIn } from './oauth-helpers.js';

let fakes: RunningFakes;
let base: string;

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  base = `http://127.0.0.1:${fakes.oauthPort}`;
});
afterAll(() => fakes.close());

describe('GET /o/oauth2/v2/auth', () => {
  it('shows the test sign-in page with presets and a labelled identity form', async () => {
    const response = await fetch(`${base}/o/oauth2/v2/auth?${authParams({ state: '"><b>x' }).toString()}`);

    const html = await response.text();
    expect(response.status).toBe(200);
    expect(html).toContain('Sign in with a test identity');
    expect(html).toContain('Rowan Test &lt;rowan.test@example.com&gt;');
    expect(html).toMatch(/<label for="identity-name">Name<\/label>\s*<input id="identity-name" name="name"/);
    expect(html).toMatch(/<label for="identity-email">Email<\/label>\s*<input id="identity-email" name="email"/);
    expect(html).toContain('name="state" value="&quot;&gt;&lt;b&gt;x"');
  });

  it.each([
    ['client_id is missing', { client_id: '' }],
    ['redirect_uri is relative', { redirect_uri: '/callback' }],
    ['redirect_uri is not http(s)', { redirect_uri: 'javascript:alert(1)' }],
    ['response_type is not code', { response_type: 'token' }],
  ])('answers 400 without redirecting when %s', async (_case, overrides) => {
    const response = await fetch(`${base}/o/oauth2/v2/auth?${authParams(overrides).toString()}`, { redirect: 'manual' });

    expect(response.status).toBe(400);
    expect(response.headers.get('location')).toBeNull();
  });
});

describe('POST /o/oauth2/v2/auth/decide', () => {
  it('redirects to redirect_uri with a code and the original state', async () => {
    const redirect = await decide(base, { name: 'Ada Typed', email: 'ada@example.org' });

    expect(`${redirect.origin}${redirect.pathname}`).toBe(CALLBACK);
    expect(redirect.searchParams.get('code')).toMatch(/\S{20,}/);
    expect(redirect.searchParams.get('state')).toBe('st-123');
  });

  it('redirects with error=access_denied when cancelled', async () => {
    const redirect = await decide(base, { decision: 'cancel' });

    expect(redirect.searchParams.get('error')).toBe('access_denied');
    expect(redirect.searchParams.get('state')).toBe('st-123');
    expect(redirect.searchParams.has('code')).toBe(false);
  });

  it('rejects a typed identity without a valid email', async () => {
    const body = authParams({ name: 'No Mail', email: 'not-an-email' });

    const response = await fetch(`${base}/o/oauth2/v2/auth/decide`, { method: 'POST', body, redirect: 'manual' });

    expect(response.status).toBe(400);
  });
});

describe('POST /token', () => {
  it('exchanges a code once for a bearer token', async () => {
    const code = (await decide(base, { preset: 'marisol' })).searchParams.get('code') ?? '';

    const first = await exchange(base, code);
    const replay = await exchange(base, code);

    expect(first).toMatchObject({ status: 200, json: { token_type: 'Bearer', expires_in: 3600, scope: 'profile email' } });
    expect(first.json.access_token).toMatch(/\S{20,}/);
    expect(first.json).not.toHaveProperty('id_token');
    expect(replay).toEqual({ status: 400, json: expect.objectContaining({ error: 'invalid_grant' }) });
  });

  it.each([
    ['another redirect_uri', { redirect_uri: 'http://127.0.0.1:5180/elsewhere' }],
    ['another client', { client_id: 'someone-else' }],
  ])('refuses a code presented with %s', async (_case, overrides) => {
    const code = (await decide(base, { preset: 'rowan' })).searchParams.get('code') ?? '';

    const result = await exchange(base, code, overrides);

    expect(result).toEqual({ status: 400, json: expect.objectContaining({ error: 'invalid_grant' }) });
  });

  it('accepts client credentials via HTTP Basic auth', async () => {
    const code = (await decide(base, { preset: 'rowan' })).searchParams.get('code') ?? '';
    const basic = Buffer.from(`${CLIENT_ID}:${CLIENT_SECRET}`).toString('base64');
    const body = new URLSearchParams({ grant_type: 'authorization_code', code, redirect_uri: CALLBACK });

    const response = await fetch(`${base}/token`, { method: 'POST', body, headers: { Authorization: `Basic ${basic}` } });

    expect(response.status).toBe(200);
  });

  it('answers 401 invalid_client without a client secret', async () => {
    const code = (await decide(base, { preset: 'rowan' })).searchParams.get('code') ?? '';

    const result = await exchange(base, code, { client_secret: '' });

    expect(result).toEqual({ status: 401, json: expect.objectContaining({ error: 'invalid_client' }) });
  });
});

describe('GET /userinfo', () => {
  it('returns OpenID claims for a token sent as the access_token query parameter', async () => {
    const token = await signIn(base, 'Lena Mangrove Test', 'lena@example.org');

    const response = await fetch(`${base}/userinfo?access_token=${encodeURIComponent(token)}`);

    expect(await response.json()).toEqual({
      sub: expect.stringMatching(/^\d{21}$/),
      name: 'Lena Mangrove Test',
      given_name: 'Lena',
      family_name: 'Mangrove Test',
      email: 'lena@example.org',
      email_verified: true,
      locale: 'en',
    });
  });

  it('keeps sub stable per email, ignoring case, and distinct between emails', async () => {
    const read = async (token: string): Promise<string> => {
      const response = await fetch(`${base}/userinfo`, { headers: { Authorization: `Bearer ${token}` } });
      return ((await response.json()) as { sub: string }).sub;
    };

    const first = await read(await signIn(base, 'Kim', 'kim@example.org'));
    const again = await read(await signIn(base, 'Kim K', 'KIM@Example.org'));
    const other = await read(await signIn(base, 'Kim', 'kim2@example.org'));

    expect(again).toBe(first);
    expect(other).not.toBe(first);
  });

  it('answers 401 for an unknown token', async () => {
    const response = await fetch(`${base}/userinfo?access_token=nope`);

    expect(response.status).toBe(401);
    expect(await response.json()).toMatchObject({ error: 'invalid_token' });
  });
});

describe('GET /__fake/grants', () => {
  it('lists issued grants newest first', async () => {
    await decide(base, { name: 'Older', email: 'older@example.org' });
    await decide(base, { name: 'Newer', email: 'newer@example.org' });

    const grants = (await (await fetch(`${base}/__fake/grants`)).json()) as Array<{ email: string; client_id: string; time: string }>;

    expect(grants.slice(0, 2).map((g) => g.email)).toEqual(['newer@example.org', 'older@example.org']);
    expect(grants[0]).toMatchObject({ client_id: CLIENT_ID, time: expect.any(String) });
  });
});
