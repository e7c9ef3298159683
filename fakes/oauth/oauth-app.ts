import express, { type Express, type Request, type Response } from 'express';
import { requestLog, type LogLine } from '../support/request-log.js';
import { parseAuthRequest, redirectWith } from './auth-request.js';
import { bearerToken, clientCredentials, formParams, param } from './client-auth.js';
import { createGrantStore, TOKEN_TTL_SECONDS, type GrantStore } from './grant-store.js';
import { isPlausibleEmail, PRESET_IDENTITIES, userInfoFor, type Identity } from './identities.js';
import { DECIDE_PATH, renderAuthError, renderSignIn } from './oauth-pages.js';

type Choice = { kind: 'cancel' } | { kind: 'identity'; identity: Identity } | { kind: 'invalid'; message: string };

/** Reads which button on the sign-in page was pressed. */
function readChoice(params: Record<string, unknown>): Choice {
  if (param(params, 'decision') === 'cancel') return { kind: 'cancel' };
  const presetKey = param(params, 'preset');
  if (presetKey !== '') {
    const preset = PRESET_IDENTITIES.find((p) => p.key === presetKey);
    return preset ? { kind: 'identity', identity: preset } : { kind: 'invalid', message: `Unknown test identity: ${presetKey}` };
  }
  const email = param(params, 'email').trim();
  if (!isPlausibleEmail(email)) return { kind: 'invalid', message: 'Enter a valid email address' };
  const name = param(params, 'name').trim() || email.slice(0, email.indexOf('@'));
  return { kind: 'identity', identity: { name, email } };
}

function sendAuthError(res: Response, message: string): void {
  res.status(400).type('html').send(renderAuthError(message));
}

function tokenError(res: Response, status: number, error: string, description: string): void {
  res.status(status).set('Cache-Control', 'no-store').json({ error, error_description: description });
}

function decide(req: Request, res: Response, grants: GrantStore): void {
  const params = formParams(req.body);
  const parsed = parseAuthRequest(params);
  if (!parsed.ok) return sendAuthError(res, parsed.message);
  const choice = readChoice(params);
  if (choice.kind === 'invalid') return sendAuthError(res, choice.message);
  const { request } = parsed;
  if (choice.kind === 'cancel') return res.redirect(302, redirectWith(request, { error: 'access_denied' }));
  const code = grants.issueCode(request, choice.identity);
  res.redirect(302, redirectWith(request, { code }));
}

function token(req: Request, res: Response, grants: GrantStore): void {
  const params = formParams(req.body);
  const client = clientCredentials(req.headers, params);
  if (!client) return tokenError(res, 401, 'invalid_client', 'Client credentials are missing');
  if (param(params, 'grant_type') !== 'authorization_code') {
    return tokenError(res, 400, 'unsupported_grant_type', 'Only authorization_code is supported');
  }
  const exchange = { code: param(params, 'code'), clientId: client.clientId, redirectUri: param(params, 'redirect_uri') };
  const result = grants.exchange(exchange);
  if (!result.ok) return tokenError(res, 400, 'invalid_grant', result.description);
  res.set('Cache-Control', 'no-store').json({
    access_token: result.accessToken, token_type: 'Bearer', expires_in: TOKEN_TTL_SECONDS, scope: result.scope,
  });
}

/** An OAuth2 provider with the hosted provider's endpoint paths and wire formats. */
export function createOAuthApp(log: LogLine, grants: GrantStore = createGrantStore()): Express {
  const app = express();
  app.disable('x-powered-by');
  app.use(requestLog('oauth', log));
  app.use(express.urlencoded({ extended: false }));

  app.get('/o/oauth2/v2/auth', (req, res) => {
    const parsed = parseAuthRequest(formParams(req.query));
    if (!parsed.ok) return sendAuthError(res, parsed.message);
    res.type('html').send(renderSignIn(parsed.request));
  });
  app.post(DECIDE_PATH, (req, res) => decide(req, res, grants));
  app.post('/token', (req, res) => token(req, res, grants));
  app.get('/userinfo', (req, res) => {
    const identity = grants.identityFor(bearerToken(req.headers, formParams(req.query)));
    if (identity) return res.json(userInfoFor(identity));
    res.status(401).set('WWW-Authenticate', 'Bearer error="invalid_token"')
      .json({ error: 'invalid_token', error_description: 'Invalid Credentials' });
  });
  app.get('/__fake/grants', (_req, res) => {
    res.json(grants.grants());
  });
  return app;
}
