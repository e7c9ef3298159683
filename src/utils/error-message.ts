import type { ErrorCode } from '@shared/errors';
import { ApiError } from '@/api/http';

export type ErrorMessages = Partial<Record<ErrorCode, string>>;

const DEFAULTS: ErrorMessages = {
  unauthenticated: 'Your session has ended. Sign in again to continue.',
  forbidden: "Your role can't do that. Ask an admin if you think it should.",
  csrf_failed: 'This page was open for a long time. Reload it and try again.',
  rate_limited: 'Too many tries in a short time. Wait a few minutes, then try again.',
  validation_failed: 'Some answers need another look.',
  not_found: "That wasn't found. It may have been removed.",
  internal_error: 'Something went wrong on our side. Try again in a moment.',
};

/** A sentence a person can act on, chosen by the error's stable code (never by the server's wording). */
export function errorMessage(err: unknown, overrides: ErrorMessages = {}): string {
  if (!(err instanceof ApiError)) return 'Something unexpected happened. Try again.';
  return overrides[err.code] ?? DEFAULTS[err.code] ?? err.message;
}

/** "must be at least 8 characters" → "Must be at least 8 characters". */
export function sentence(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
