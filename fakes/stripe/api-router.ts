import express, { type ErrorRequestHandler, type Request, type RequestHandler, type Response } from 'express';
import { randomId } from '../support/ids.js';
import type { LogLine } from '../support/request-log.js';
import type { CheckoutFlow } from './checkout-flow.js';
import { createCheckoutSession } from './checkout-session.js';
import { formObject, integer, text } from './form-body.js';
import { createRefund, type RefundDeps } from './refunds.js';
import { resourceMissing, sendStripeError, type StripeApiError } from './stripe-errors.js';
import type { StripeStore } from './stripe-store.js';
import type { EventRequest } from './webhook-event.js';

export interface ApiRouterDeps extends RefundDeps {
  log: LogLine;
  baseUrl: () => string;
  checkout: CheckoutFlow;
}

type Answer = { status: number; body: unknown };
const ok = (body: unknown): Answer => ({ status: 200, body });
const failed = (status: number, error: StripeApiError): Answer => ({ status, body: { error } });

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

/** Events name the API request that caused them, as the service's `request` field does. */
function eventRequest(req: Request, res: Response): EventRequest {
  return { id: res.get('Request-Id') ?? null, idempotency_key: req.get('idempotency-key') ?? null };
}

/**
 * The SDK retries POSTs with the same Idempotency-Key; replaying the first successful
 * answer keeps a retry from acting twice. Failed requests are not saved under their key,
 * and a key reused with other parameters is refused, as the service does.
 */
function idempotent(store: StripeStore, run: (req: Request, res: Response) => Answer): RequestHandler {
  return (req, res) => {
    const key = req.get('idempotency-key');
    const request = `${req.method} ${req.baseUrl}${req.path} ${JSON.stringify(req.body ?? {})}`;
    const replayed = key ? store.replay(key) : undefined;
    if (replayed && replayed.request !== request) {
      const message = `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`;
      return sendStripeError(res, 400, { type: 'idempotency_error', message });
    }
    if (replayed) return void res.set('Idempotent-Replayed', 'true').status(replayed.status).json(replayed.body);
    const answer = run(req, res);
    if (key && answer.status === 200) store.remember(key, { status: 200, body: structuredClone(answer.body), request });
    res.status(answer.status).json(answer.body);
  };
}

function listSessions(req: Request, deps: ApiRouterDeps): Answer {
  const query = formObject(req.query);
  const intent = text(query, 'payment_intent');
  const status = text(query, 'status');
  const limit = Math.min(Math.max(integer(query, 'limit') ?? 10, 1), 100);
  const matching = deps.store
    .sessions()
    .map((stored) => deps.checkout.lookup(stored.session.id)?.session)
    .filter((session) => session !== undefined)
    .filter((session) => (intent === undefined || session.payment_intent === intent) && (status === undefined || session.status === status));
  const data = matching.slice(0, limit);
  return ok({ object: 'list', data, has_more: matching.length > data.length, url: '/v1/checkout/sessions' });
}

function retrieve(kind: string, found: unknown, id: string): Answer {
  return found ? ok(found) : failed(404, resourceMissing(kind, id));
}

/** The payments HTTP API under `/v1`: form-encoded requests, JSON answers, the API's errors. */
export function createApiRouter(deps: ApiRouterDeps): express.Router {
  const { store, checkout } = deps;
  const api = express.Router();
  const send = (run: (req: Request) => Answer): RequestHandler => (req, res) => {
    const answer = run(req);
    res.status(answer.status).json(answer.body);
  };
  api.use(express.urlencoded({ extended: true, limit: '1mb' }), recorder(store), requireTestKey);
  api.post('/checkout/sessions', idempotent(store, (req) => {
    const result = createCheckoutSession(formObject(req.body), deps.baseUrl(), deps.now());
    if (!result.ok) return failed(400, result.error);
    store.saveSession(result.stored);
    deps.log(`[stripe] created ${result.stored.session.id} for ${result.stored.session.amount_total} ${result.stored.session.currency}`);
    return ok(result.stored.session);
  }));
  api.get('/checkout/sessions', send((req) => listSessions(req, deps)));
  api.get('/checkout/sessions/:id', send((req) => retrieve('checkout.session', checkout.lookup(String(req.params.id))?.session, String(req.params.id))));
  api.post('/checkout/sessions/:id/expire', idempotent(store, (req, res) => {
    const outcome = checkout.expire(String(req.params.id), eventRequest(req, res));
    return outcome.ok ? ok(outcome.stored.session) : failed(outcome.status, outcome.error);
  }));
  api.get('/payment_intents/:id', send((req) => retrieve('payment_intent', store.findIntent(String(req.params.id)), String(req.params.id))));
  api.get('/charges/:id', send((req) => retrieve('charge', store.findCharge(String(req.params.id)), String(req.params.id))));
  api.get('/refunds/:id', send((req) => retrieve('refund', store.findRefund(String(req.params.id)), String(req.params.id))));
  api.post('/refunds', idempotent(store, (req, res) => {
    const outcome = createRefund(formObject(req.body), eventRequest(req, res), deps);
    return outcome.ok ? ok(outcome.refund) : failed(outcome.status, outcome.error);
  }));
  api.use((req, res) => {
    const message = `Unrecognized request URL (${req.method}: ${req.baseUrl}${req.path}). The payments fake does not implement it.`;
    sendStripeError(res, 404, { type: 'invalid_request_error', message });
  });
  api.use(apiErrorHandler);
  return api;
}
