import type { Request } from 'express';
import { Strategy as GoogleStrategy, type Profile } from 'passport-google-oauth20';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';
import { CALLBACK, CLIENT_ID, CLIENT_SECRET, signIn } from './oauth-helpers.js';

let fakes: RunningFakes;
let base: string;

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  base = `http://127.0.0.1:${fakes.oauthPort}`;
});
afterAll(() => fakes.close());

/** The app decides what a user is; here any object that passport hands back unchanged will do. */
const SIGNED_IN_USER = { signedIn: true } as unknown as Express.User;

function strategy(verify: (profile: Profile) => void = () => undefined): GoogleStrategy {
  return new GoogleStrategy(
    {
      clientID: CLIENT_ID,
      clientSecret: CLIENT_SECRET,
      callbackURL: CALLBACK,
      authorizationURL: `${base}/o/oauth2/v2/auth`,
      tokenURL: `${base}/token`,
      userProfileURL: `${base}/userinfo`,
    },
    (_accessToken, _refreshToken, profile, done) => {
      verify(profile);
      done(null, SIGNED_IN_USER);
    },
  );
}

function userProfile(google: GoogleStrategy, token: string): Promise<Profile> {
  return new Promise((resolve, reject) => {
    google.userProfile(token, (error: unknown, profile?: Profile) => {
      if (error) reject(error instanceof Error ? error : new Error(String(error)));
      else if (profile) resolve(profile);
      else reject(new Error('no profile'));
    });
  });
}

/** Drives passport's authenticate() the way the router would, capturing where it ends. */
function authenticate(google: GoogleStrategy, query: Record<string, string>): Promise<{ redirect?: string; user?: unknown }> {
  return new Promise((resolve, reject) => {
    google.redirect = (url) => resolve({ redirect: url });
    google.success = (user) => resolve({ user });
    google.fail = (challenge) => reject(new Error(`fail: ${JSON.stringify(challenge)}`));
    google.error = (error) => reject(error instanceof Error ? error : new Error(String(error)));
    const req = { query, body: {}, headers: { host: '127.0.0.1:5180' }, url: '/api/auth/google/callback' };
    google.authenticate(req as unknown as Request, { scope: ['profile', 'email'] });
  });
}

describe('passport-google-oauth20 against the OAuth2 fake', () => {
  it('loads the OpenID profile from /userinfo with userProfile()', async () => {
    const token = await signIn(base, 'Rowan Test', 'rowan.test@example.com');

    const profile = await userProfile(strategy(), token);

    expect(profile.emails?.[0]?.value).toBe('rowan.test@example.com');
    expect(profile.id).toMatch(/^\d{21}$/);
    expect(profile).toMatchObject({ provider: 'google', displayName: 'Rowan Test', name: { givenName: 'Rowan', familyName: 'Test' } });
  });

  it('reports a bad token as an error from userProfile()', async () => {
    await expect(userProfile(strategy(), 'not-a-token')).rejects.toThrow(/Invalid Credentials/);
  });

  it('completes the whole redirect, sign-in and callback flow', async () => {
    const verified: Profile[] = [];
    const google = strategy((profile) => verified.push(profile));
    const start = await authenticate(google, {});
    const page = await fetch(start.redirect ?? '');
    expect(page.status).toBe(200);
    const location = new URL(start.redirect ?? '');
    const decision = new URLSearchParams(location.searchParams);
    decision.set('preset', 'marisol');

    const chosen = await fetch(`${base}/o/oauth2/v2/auth/decide`, { method: 'POST', body: decision, redirect: 'manual' });
    const callback = new URL(chosen.headers.get('location') ?? '');
    const end = await authenticate(google, Object.fromEntries(callback.searchParams));

    expect(`${callback.origin}${callback.pathname}`).toBe(CALLBACK);
    expect(end.user).toBe(SIGNED_IN_USER);
    expect(verified.map((profile) => profile.emails?.[0]?.value)).toEqual(['marisol.test@example.com']);
  });
});
