/** The parameters of an authorization request, as carried from the page to the decision. */
export interface AuthRequest {
  clientId: string;
  redirectUri: string;
  scope: string;
  state: string;
}

export type AuthRequestResult = { ok: true; request: AuthRequest } | { ok: false; message: string };

type Params = Record<string, unknown>;

function text(params: Params, key: string): string {
  const value = params[key];
  return typeof value === 'string' ? value : '';
}

function isAbsoluteHttpUrl(value: string): boolean {
  if (!URL.canParse(value)) return false;
  const { protocol } = new URL(value);
  return protocol === 'http:' || protocol === 'https:';
}

/**
 * Validates the request the way the hosted provider does before showing a sign-in
 * page: a bad client or redirect target gets an error page, never a redirect,
 * because redirecting to an unvalidated URL would make the provider an open redirector.
 */
export function parseAuthRequest(params: Params): AuthRequestResult {
  const responseType = text(params, 'response_type');
  const request: AuthRequest = {
    clientId: text(params, 'client_id').trim(),
    redirectUri: text(params, 'redirect_uri'),
    scope: text(params, 'scope'),
    state: text(params, 'state'),
  };
  if (request.clientId === '') return { ok: false, message: 'Missing required parameter: client_id' };
  if (!isAbsoluteHttpUrl(request.redirectUri)) {
    return { ok: false, message: 'Invalid parameter: redirect_uri must be an absolute http(s) URL' };
  }
  if (responseType !== 'code') {
    return { ok: false, message: `Unsupported response_type: ${responseType || '(missing)'}; only "code" is supported` };
  }
  return { ok: true, request };
}

/** Builds `redirect_uri?...&state=...`, keeping any query the client put in its redirect URI. */
export function redirectWith(request: AuthRequest, params: Record<string, string>): string {
  const url = new URL(request.redirectUri);
  for (const [key, value] of Object.entries(params)) url.searchParams.set(key, value);
  if (request.state !== '') url.searchParams.set('state', request.state);
  return url.toString();
}
