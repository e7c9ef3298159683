import type { IncomingHttpHeaders } from 'node:http';

export interface ClientCredentials {
  clientId: string;
  clientSecret: string;
}

/** Express's urlencoded parser types its result as `any`; narrow it before use. */
export function formParams(body: unknown): Record<string, unknown> {
  return typeof body === 'object' && body !== null && !Array.isArray(body) ? { ...body } : {};
}

export function param(params: Record<string, unknown>, key: string): string {
  const value = params[key];
  return typeof value === 'string' ? value : '';
}

function formDecode(value: string): string | undefined {
  try {
    return decodeURIComponent(value.replace(/\+/g, ' '));
  } catch {
    return undefined;
  }
}

/** RFC 6749 §2.3.1: Basic credentials are form-encoded before base64. */
function fromBasic(header: string | undefined): ClientCredentials | undefined {
  const match = /^Basic\s+(\S+)$/i.exec(header ?? '');
  if (!match?.[1]) return undefined;
  const decoded = Buffer.from(match[1], 'base64').toString('utf8');
  const colon = decoded.indexOf(':');
  if (colon < 0) return undefined;
  const clientId = formDecode(decoded.slice(0, colon));
  const clientSecret = formDecode(decoded.slice(colon + 1));
  return clientId !== undefined && clientSecret !== undefined ? { clientId, clientSecret } : undefined;
}

/**
 * Client credentials from HTTP Basic auth or, as passport's OAuth2 client sends
 * them, from the body. Returns undefined when either part is missing.
 */
export function clientCredentials(headers: IncomingHttpHeaders, params: Record<string, unknown>): ClientCredentials | undefined {
  const credentials = fromBasic(headers.authorization) ?? {
    clientId: param(params, 'client_id'),
    clientSecret: param(params, 'client_secret'),
  };
  return credentials.clientId !== '' && credentials.clientSecret !== '' ? credentials : undefined;
}

/** The access token from `?access_token=` (how passport-google-oauth20 sends it) or a Bearer header. */
export function bearerToken(headers: IncomingHttpHeaders, query: Record<string, unknown>): string {
  const fromQuery = param(query, 'access_token');
  if (fromQuery !== '') return fromQuery;
  return /^Bearer\s+(\S+)$/i.exec(headers.authorization ?? '')?.[1] ?? '';
}
