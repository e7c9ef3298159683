import { expect } from 'vitest';

export const CLIENT_ID = 'ebbroot-test-client';
export const CLIENT_SECRET = 'ebbroot-test-secret';
export const CALLBACK = 'http://127.0.0.1:5180/api/auth/google/callback';

export interface TokenJson {
  access_token?: string;
  token_type?: string;
  expires_in?: number;
  scope?: string;
  error?: string;
}

export function authParams(overrides: Record<string, string> = {}): URLSearchParams {
  return new URLSearchParams({
    response_type: 'code',
    client_id: CLIENT_ID,
    redirect_uri: CALLBACK,
    scope: 'profile email',
    state: 'st-123',
    ...overrides,
  });
}

/** Posts the sign-in page's decision form and returns the redirect target. */
export async function decide(base: string, choice: Record<string, string>, overrides: Record<string, string> = {}): Promise<URL> {
  const body = authParams(overrides);
  for (const [key, value] of Object.entries(choice)) body.set(key, value);
  const response = await fetch(`${base}/o/oauth2/v2/auth/decide`, { method: 'POST', body, redirect: 'manual' });
  expect(response.status).toBe(302);
  return new URL(response.headers.get('location') ?? '');
}

export async function exchange(base: string, code: string, overrides: Record<string, string> = {}): Promise<{ status: number; json: TokenJson }> {
  const body = new URLSearchParams({
    grant_type: 'authorization_code',
    code,
    redirect_uri: CALLBACK,
    client_id: CLIENT_ID,
    client_secret: CLIENT_SECRET,
    ...overrides,
  });
  const response = await fetch(`${base}/token`, { method: 'POST', body });
  return { status: response.status, json: (await response.json()) as TokenJson };
}

/** Runs the whole browser part of the flow for one identity and returns an access token. */
export async function signIn(base: string, name: string, email: string): Promise<string> {
  const redirect = await decide(base, { name, email });
  const { json } = await exchange(base, redirect.searchParams.get('code') ?? '');
  return json.access_token ?? '';
}
