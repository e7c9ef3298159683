import passport, { type PassportStatic } from 'passport';
import { Strategy as GoogleStrategy, type Profile } from 'passport-google-oauth20';
import type { GoogleIdentity } from '../services/auth.service.js';

/** A passport instance of the app's own (not the module's global singleton). */
export type PassportInstance = InstanceType<PassportStatic['Authenticator']>;

export const createPassport = (): PassportInstance => new passport.Authenticator();

export interface GoogleAuthConfig {
  clientId: string;
  clientSecret: string;
  callbackUrl: string;
  authorizationUrl: string;
  tokenUrl: string;
  userInfoUrl: string;
}

function identityFrom(profile: Profile): GoogleIdentity | undefined {
  const email = profile.emails?.[0];
  if (!email?.value) return undefined;
  // The OpenID userinfo parser copies email_verified onto the e-mail entry; the typings omit it.
  const verified = 'verified' in email ? email.verified : undefined;
  return { sub: profile.id, email: email.value, name: profile.displayName, emailVerified: verified === true || verified === 'true' };
}

/**
 * Registers passport's Google strategy. The endpoints come from configuration, so development
 * and tests reach the OAuth2 fake with the production code path unchanged.
 */
export function useGoogleStrategy(
  passport: PassportInstance,
  cfg: GoogleAuthConfig,
  signIn: (identity: GoogleIdentity) => Promise<Express.User>,
): void {
  const strategy = new GoogleStrategy(
    {
      clientID: cfg.clientId,
      clientSecret: cfg.clientSecret,
      callbackURL: cfg.callbackUrl,
      authorizationURL: cfg.authorizationUrl,
      tokenURL: cfg.tokenUrl,
      userProfileURL: cfg.userInfoUrl,
      state: true,
    },
    (_accessToken, _refreshToken, profile, done) => {
      const identity = identityFrom(profile);
      if (!identity) return done(null, undefined, { message: 'Google did not share an e-mail address' });
      signIn(identity).then((user) => done(null, user), (err: unknown) => done(err as Error));
    },
  );
  passport.use(strategy);
}
