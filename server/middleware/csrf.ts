import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { AppError } from '../errors.js';

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export const SESSION_COOKIE = 'ebbroot.sid';
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The session's synchronizer token, created on first ask. */
export function csrfTokenFor(req: Request): string {
  req.session.csrfToken ??= randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

function hasSessionCookie(req: Request): boolean {
  return (req.headers.cookie ?? '').split(';').some((c) => c.trim().startsWith(`${SESSION_COOKIE}=`));
}

function sameToken(a: string | undefined, b: string | undefined): boolean {
  if (!a || !b) return false;
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/**
 * Every state-changing request that carries a session cookie must echo the session's token
 * in X-CSRF-Token. Requests without a session cookie have no ambient authority to abuse.
 */
export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method) || !hasSessionCookie(req)) return next();
  if (sameToken(req.get('x-csrf-token'), req.session?.csrfToken)) return next();
  next(new AppError(403, 'csrf_failed', 'Missing or stale security token; reload the page and try again'));
};
