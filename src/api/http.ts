import { z } from 'zod';
import { ErrorBody, type ErrorCode } from '@shared/errors';

/** A failed API call, carrying the server's stable error code (see shared/errors.ts). */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ErrorCode;
  readonly fields: Record<string, string[]> | undefined;
  /** Structured reasons some endpoints add (e.g. a refused trip-plan edit); each caller parses its own. */
  readonly violations: unknown[] | undefined;

  constructor(status: number, code: ErrorCode, message: string, fields?: Record<string, string[]>, violations?: unknown[]) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.violations = violations;
  }
}

const CsrfResponse = z.object({ token: z.string().min(1) });

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

let csrfToken: Promise<string> | null = null;

/** Forget the cached CSRF token; the session (and so the token) changes at sign-in and sign-out. */
export function resetCsrfToken(): void {
  csrfToken = null;
}

function csrf(): Promise<string> {
  if (csrfToken) return csrfToken;
  const pending = send('GET', '/api/auth/csrf', undefined, null)
    .then((res) => parseBody(res, CsrfResponse))
    .then((body) => body.token)
    .catch((err: unknown) => {
      if (csrfToken === pending) csrfToken = null;
      throw err;
    });
  csrfToken = pending;
  return pending;
}

async function send(method: Method, path: string, body: unknown, token: string | null): Promise<Response> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // FormData sets its own multipart Content-Type with the boundary.
  const form = body instanceof FormData;
  if (body !== undefined && !form) headers['Content-Type'] = 'application/json';
  if (token !== null) headers['X-CSRF-Token'] = token;
  try {
    return await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: form ? body : body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'service_unavailable', "Can't reach Ebbroot. Check your connection and try again.");
  }
}

async function readJson(res: Response): Promise<unknown> {
  try {
    return await res.json();
  } catch {
    return undefined;
  }
}

async function toApiError(res: Response): Promise<ApiError> {
  const parsed = ErrorBody.safeParse(await readJson(res));
  if (parsed.success) {
    const { code, message, fields, violations } = parsed.data.error;
    return new ApiError(res.status, code, message, fields, violations);
  }
  return new ApiError(res.status, 'internal_error', `Something went wrong on the server (HTTP ${res.status}).`);
}

async function parseBody<T>(res: Response, schema: z.ZodType<T>): Promise<T> {
  if (!res.ok) throw await toApiError(res);
  const parsed = schema.safeParse(await readJson(res));
  if (!parsed.success) {
    throw new ApiError(res.status, 'internal_error', 'The server sent an answer Ebbroot did not expect.');
  }
  return parsed.data;
}

async function call(method: Method, path: string, body?: unknown): Promise<Response> {
  if (method === 'GET') return send(method, path, undefined, null);
  let res = await send(method, path, body, await csrf());
  if (res.status === 403) {
    const err = await toApiError(res.clone());
    if (err.code === 'csrf_failed') {
      resetCsrfToken();
      res = await send(method, path, body, await csrf());
    }
  }
  return res;
}

async function finish<T>(res: Response, schema?: z.ZodType<T>): Promise<T | undefined> {
  if (schema) return parseBody(res, schema);
  if (!res.ok) throw await toApiError(res);
  return undefined;
}

/** GET JSON and check it against `schema`. */
export async function get<T>(path: string, schema: z.ZodType<T>): Promise<T> {
  return parseBody(await call('GET', path), schema);
}

export function post<T>(path: string, body: unknown, schema: z.ZodType<T>): Promise<T>;
export function post(path: string, body?: unknown): Promise<void>;
export async function post<T>(path: string, body?: unknown, schema?: z.ZodType<T>): Promise<T | undefined> {
  return finish(await call('POST', path, body ?? {}), schema);
}

/** POST multipart/form-data (uploads), with the CSRF header like every other write. */
export async function postForm<T>(path: string, form: FormData, schema: z.ZodType<T>): Promise<T> {
  return parseBody(await call('POST', path, form), schema);
}

export function patch<T>(path: string, body: unknown, schema: z.ZodType<T>): Promise<T>;
export function patch(path: string, body: unknown): Promise<void>;
export async function patch<T>(path: string, body: unknown, schema?: z.ZodType<T>): Promise<T | undefined> {
  return finish(await call('PATCH', path, body), schema);
}

export function put<T>(path: string, body: unknown, schema: z.ZodType<T>): Promise<T>;
export function put(path: string, body: unknown): Promise<void>;
export async function put<T>(path: string, body: unknown, schema?: z.ZodType<T>): Promise<T | undefined> {
  return finish(await call('PUT', path, body), schema);
}

export function del<T>(path: string, schema: z.ZodType<T>): Promise<T>;
export function del(path: string): Promise<void>;
export async function del<T>(path: string, schema?: z.ZodType<T>): Promise<T | undefined> {
  return finish(await call('DELETE', path), schema);
}

/** Builds `?a=1&b=2`, leaving out empty values. */
export function queryString(params: Record<string, string | undefined>): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== '') search.set(key, value);
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}
