import { randomId } from '../support/ids.js';
import type { AuthRequest } from './auth-request.js';
import type { Identity } from './identities.js';

/** The hosted provider's codes live about ten minutes; tokens an hour. */
const CODE_TTL_MS = 10 * 60 * 1000;
export const TOKEN_TTL_SECONDS = 3600;
const MAX_GRANTS = 500;

export interface GrantRecord {
  email: string;
  client_id: string;
  scope: string;
  time: string;
}

interface PendingCode {
  request: AuthRequest;
  identity: Identity;
  expiresAt: number;
}

interface IssuedToken {
  identity: Identity;
  expiresAt: number;
}

export interface TokenExchange {
  code: string;
  clientId: string;
  redirectUri: string;
}

export type ExchangeResult =
  | { ok: true; accessToken: string; scope: string }
  | { ok: false; description: string };

export interface GrantStore {
  issueCode(request: AuthRequest, identity: Identity): string;
  exchange(input: TokenExchange): ExchangeResult;
  identityFor(accessToken: string): Identity | undefined;
  /** Newest first. */
  grants(): GrantRecord[];
}

export function createGrantStore(now: () => number = Date.now): GrantStore {
  const codes = new Map<string, PendingCode>();
  const tokens = new Map<string, IssuedToken>();
  const grants: GrantRecord[] = [];
  return {
    issueCode(request, identity) {
      const code = randomId('4/fake-', 40);
      codes.set(code, { request, identity, expiresAt: now() + CODE_TTL_MS });
      grants.unshift({ email: identity.email, client_id: request.clientId, scope: request.scope, time: new Date(now()).toISOString() });
      if (grants.length > MAX_GRANTS) grants.length = MAX_GRANTS;
      return code;
    },
    exchange({ code, clientId, redirectUri }) {
      const pending = codes.get(code);
      if (!pending || pending.expiresAt < now()) return { ok: false, description: 'Invalid or expired authorization code' };
      if (pending.request.clientId !== clientId) return { ok: false, description: 'Code was issued to another client' };
      if (pending.request.redirectUri !== redirectUri) return { ok: false, description: 'redirect_uri does not match the authorization request' };
      // One-time: a replayed code must fail, as it does against the hosted provider.
      codes.delete(code);
      const accessToken = randomId('ya29.fake-', 48);
      tokens.set(accessToken, { identity: pending.identity, expiresAt: now() + TOKEN_TTL_SECONDS * 1000 });
      return { ok: true, accessToken, scope: pending.request.scope };
    },
    identityFor(accessToken) {
      const issued = tokens.get(accessToken);
      return issued && issued.expiresAt >= now() ? issued.identity : undefined;
    },
    grants: () => [...grants],
  };
}
