import type { Response } from 'express';

/** The error envelope of the payments API; the SDK turns it into a typed StripeError. */
export interface StripeApiError {
  type: 'invalid_request_error' | 'api_error' | 'idempotency_error';
  message: string;
  code?: string;
  param?: string;
}

export function sendStripeError(res: Response, status: number, error: StripeApiError): void {
  res.status(status).json({ error });
}

export function missingParam(param: string): StripeApiError {
  return { type: 'invalid_request_error', code: 'parameter_missing', param, message: `Missing required param: ${param}.` };
}

/** Stripe leaves `code` off for many bad values, and names the specific problem for others. */
export function invalidParam(param: string, message: string, code?: string): StripeApiError {
  return { type: 'invalid_request_error', param, message, ...(code ? { code } : {}) };
}

export function resourceMissing(kind: string, id: string, param = 'id'): StripeApiError {
  return { type: 'invalid_request_error', code: 'resource_missing', param, message: `No such ${kind}: '${id}'` };
}
