import type { ErrorCode } from '../shared/errors.js';

/** An error the API answers with a 4xx/5xx and the shared ErrorBody. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    /** Structured reasons, written as `error.violations` beside `fields`. */
    readonly violations?: unknown[],
  ) {
    super(message);
  }
}

export class ValidationError extends AppError {
  constructor(message: string, fields?: Record<string, string[]>, violations?: unknown[]) {
    super(400, 'validation_failed', message, fields, violations);
  }
}

export class NotFoundError extends AppError {
  constructor(what: string) {
    super(404, 'not_found', `${what} not found`);
  }
}

export class ConflictError extends AppError {
  constructor(message: string, fields?: Record<string, string[]>) {
    super(409, 'conflict', message, fields);
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in first') {
    super(401, 'unauthenticated', message);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'Your role does not allow this') {
    super(403, 'forbidden', message);
  }
}
