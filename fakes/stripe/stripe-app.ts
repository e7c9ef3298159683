import express, { type ErrorRequestHandler, type Express, type RequestHandler } from 'express';
import { randomId } from '../support/ids.js';
import { requestLog, type LogLine } from '../support/request-log.js';
import { createCheckoutSession } from './checkout-session.js';
import { formObject } from './form-body.js';
import { renderMissingSession, renderPayPage } from './pay-page.js';
import { resourceMissing, sendStripeError } from './stripe-errors.js';
import { createStripeStore, type StripeStore } from './stripe-store.js';

export interface StripeAppOptions {
  log: LogLine;
  /** Where payers reach this fake; known only once the server is bound. */
  baseUrl: () => string;
  store?: StripeStore;
}

/** Test-mode secret keys only, so a live key pasted into dev config fails loudly. */
const requireTestKey: RequestHandler = (req, res, next) => {
  const key = /^Bearer\s+(\S+)$/i.exec(req.get('authorization') ?? '')?.[1];
  if (key?.startsWith('sk_test_')) return next();
  const message = key
    ? `Invalid API Key provided: ${key.slice(0, 8)}****. The payments fake accepts sk_test_ keys only.`
    : 'You did not provide an API key. Provide it as a Bearer token in the Authorization header.';
  sendStripeError(res, 401, { type: 'invalid_request_error', message });
};

function recorder(store: StripeStore): RequestHandler {
  return (req, res, next) => {
    res.set('Request-Id', randomId('req_', 14));
    const { method } = req;
    const path = `${req.baseUrl}${req.path}`;
    store.recordRequest({ method, path, body: formObject(req.body), query: formObject(req.query), time: new Date().toISOString() });
    next();
  };
}

/** Malformed bodies and bugs still answer in the API's error envelope, which the SDK can read. */
const apiErrorHandler: ErrorRequestHandler = (error: unknown, _req, res, _next) => {
  const status = typeof error === 'object' && error !== null && 'status' in error && typeof error.status === 'number' ? error.status : 500;
  const message = error instanceof Error ? error.message : String(error);
  sendStripeError(res, status, { type: status < 500 ? 'invalid_request_error' : 'api_error', message });
};


function createApiRouter(options: StripeAppOptions, store: StripeStore): express.Router {
  const api = express.Router();
  api.use(express.urlencoded({ extended: true, limit: '1mb' }), recorder(store), requireTestKey);
  api.post('/checkout/sessions', (req, res) => {
    const key = req.get('idempotency-key');
    const replayed = key ? store.replay(key) : undefined;
    if (replayed) return void res.set('Idempotent-Replayed', 'true').status(replayed.status).json(replayed.body);
    const result = createCheckoutSession(formObject(req.body), options.baseUrl(), Math.floor(Date.now() / 1000));
    // Like the API, a request that fails validation is not saved under its key.
    if (!result.ok) return sendStripeError(res, 400, result.error);
    const { session } = result.stored;
    store.saveSession(result.stored);
    if (key) store.remember(key, { status: 200, body: structuredClone(session) });
    options.log(`[stripe] created ${session.id} for ${session.amount_total} ${session.currency}`);
    res.json(session);
  });
  api.get('/checkout/sessions/:id', (req, res) => {
    const stored = store.findSession(req.params.id);
    if (stored) return void res.json(stored.session);
    sendStripeError(res, 404, resourceMissing('checkout.session', req.params.id));
  });
  api.use((req, res) => {
    const message = `Unrecognized request URL (${req.method}: ${req.baseUrl}${req.path}). The payments fake does not implement it.`;
    sendStripeError(res, 404, { type: 'invalid_request_error', message });
  });
  api.use(apiErrorHandler);
  return api;
}

/** The payments HTTP API at `/v1`, a hosted checkout page, and inspection endpoints. */
export function createStripeApp(options: StripeAppOptions): Express {
  const store = options.store ?? createStripeStore();
  const app = express();
  app.disable('x-powered-by');
  // The SDK sends list and expand parameters in bracket notation on GET too.
  app.set('query parser', 'extended');
  app.use(requestLog('stripe', options.log));
  app.use('/v1', createApiRouter(options, store));
  app.get('/pay/:id', (req, res) => {
    const stored = store.findSession(req.params.id);
    if (stored) return void res.type('html').send(renderPayPage(stored));
    res.status(404).type('html').send(renderMissingSession(req.params.id));
  });
  app.get('/__fake/requests', (_req, res) => void res.json(store.requests()));
  app.get('/__fake/sessions', (_req, res) => void res.json(store.sessions().map((stored) => stored.session)));
  return app;
}
