import { z } from 'zod';

/** Stable error codes; clients branch on these, never on the message. */
export const ErrorCode = z.enum([
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'csrf_failed',
  'not_found',
  'conflict',
  'rate_limited',
  'invalid_credentials',
  'invalid_token',
  'payload_too_large',
  'service_unavailable',
  'internal_error',
]);
export type ErrorCode = z.infer<typeof ErrorCode>;

/** The one shape of every non-2xx response body. */
export const ErrorBody = z.object({
  error: z.object({
    code: ErrorCode,
    message: z.string(),
    fields: z.record(z.string(), z.array(z.string())).optional(),
    /** Structured reasons where a feature has them (e.g. a refused trip-plan edit's broken rules). */
    violations: z.array(z.unknown()).optional(),
  }),
});
export type ErrorBody = z.infer<typeof ErrorBody>;

/** Maps zod issues to `{ "a.b": ["message"] }`, the `fields` of an ErrorBody. */
export function fieldsFromIssues(issues: readonly { path: readonly PropertyKey[]; message: string }[]): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join('.') || '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}
