import type { ErrorRequestHandler, RequestHandler } from 'express';
import { QueryFailedError } from 'typeorm';
import { ZodError } from 'zod';
import { fieldsFromIssues, type ErrorBody } from '../../shared/errors.js';
import { AppError, NotFoundError } from '../errors.js';

function toAppError(err: unknown): AppError | undefined {
  if (err instanceof AppError) return err;
  if (err instanceof ZodError) return new AppError(400, 'validation_failed', 'The request is invalid', fieldsFromIssues(err.issues));
  if (err instanceof QueryFailedError) {
    const code = (err.driverError as { code?: string } | undefined)?.code;
    if (code === '23505') return new AppError(409, 'conflict', 'That already exists');
    if (code === '22P02') return new AppError(400, 'validation_failed', 'A value has the wrong format');
  }
  // body-parser marks its own failures with `type` and a 4xx `status`.
  const parserError = err as { type?: string; status?: number };
  if (parserError.type === 'entity.parse.failed') return new AppError(400, 'validation_failed', 'The body is not valid JSON');
  if (parserError.type === 'entity.too.large') return new AppError(413, 'payload_too_large', 'The body is too large');
  if (typeof parserError.status === 'number' && parserError.status >= 400 && parserError.status < 500) {
    return new AppError(400, 'validation_failed', 'The request could not be read');
  }
  return undefined;
}

/** The one place that writes error bodies (STYLE §4). */
export function errorHandler(opts: { exposeStack: boolean; log: (line: string) => void }): ErrorRequestHandler {
  return (err, req, res, _next) => {
    const known = toAppError(err);
    const status = known?.status ?? 500;
    const body: ErrorBody = {
      error: known
        ? { code: known.code, message: known.message, ...(known.fields ? { fields: known.fields } : {}), ...(known.violations ? { violations: known.violations } : {}) }
        : { code: 'internal_error', message: 'Something went wrong on our side' },
    };
    if (!known) {
      const stack = err instanceof Error ? err.stack : String(err);
      opts.log(`[${req.id ?? '-'}] 500 ${req.method} ${req.originalUrl}: ${stack}`);
      if (opts.exposeStack) Object.assign(body.error, { stack });
    }
    if (res.headersSent) return;
    res.status(status).json(body);
  };
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No API route ${req.method} ${req.path}`));
};
