import type { RequestHandler } from 'express';
import { rateLimit, type Options } from 'express-rate-limit';
import { AppError } from '../errors.js';

const FIFTEEN_MINUTES = 15 * 60_000;

function limiter(opts: Partial<Options> & { message: string }): RequestHandler {
  const { message, ...rest } = opts;
  return rateLimit({
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'rate_limited', message)),
    ...rest,
  });
}

function accountKey(body: unknown): string {
  const email = typeof body === 'object' && body !== null && 'email' in body ? String(body.email) : '';
  return `account:${email.trim().toLowerCase()}`;
}

/**
 * Failed sign-ins: at most 10 per address and 10 per account in 15 minutes; successful
 * sign-ins are not counted. Counters live in process memory (one instance; see DEVELOPERS.md).
 */
export function signInLimiters(): RequestHandler[] {
  const message = 'Too many failed sign-in attempts; wait 15 minutes or reset your password';
  return [
    limiter({ windowMs: FIFTEEN_MINUTES, limit: 10, skipSuccessfulRequests: true, message }),
    limiter({ windowMs: FIFTEEN_MINUTES, limit: 10, skipSuccessfulRequests: true, message, keyGenerator: (req) => accountKey(req.body) }),
  ];
}

/** New accounts: at most 100 an hour from one address. */
export function registrationLimiter(): RequestHandler {
  return limiter({ windowMs: 60 * 60_000, limit: 100, message: 'Too many new accounts from this address; try again later' });
}

/** Reset e-mails: a handful per address, so the form cannot be used to flood someone's inbox. */
export function resetRequestLimiter(): RequestHandler {
  return limiter({ windowMs: FIFTEEN_MINUTES, limit: 20, message: 'Too many reset requests; try again later' });
}
