import express, { type Response } from 'express';
import type { CheckoutFlow, PayOutcome } from './checkout-flow.js';
import type { StripeStore } from './stripe-store.js';
import type { WebhookEndpoint, WebhookSender } from './webhook-sender.js';

type Json = Record<string, unknown>;

function problem(res: Response, status: number, code: string, message: string): void {
  res.status(status).json({ error: { code, message } });
}

function isHttpUrl(value: unknown): value is string {
  if (typeof value !== 'string' || !URL.canParse(value)) return false;
  return ['http:', 'https:'].includes(new URL(value).protocol);
}

function isDelayList(value: unknown): value is number[] {
  return Array.isArray(value) && value.length <= 20 && value.every((ms) => typeof ms === 'number' && Number.isFinite(ms) && ms >= 0 && ms <= 60_000);
}

/** `{ url, secret, retryDelaysMs? }`, or a message saying what is wrong. */
function parseEndpoint(body: Json): WebhookEndpoint | string {
  if (!isHttpUrl(body.url)) return 'url must be an http(s) URL';
  if (typeof body.secret !== 'string' || body.secret === '') return 'secret must be a non-empty string';
  if (body.retryDelaysMs !== undefined && !isDelayList(body.retryDelaysMs)) return 'retryDelaysMs must be up to 20 numbers of milliseconds (0–60000)';
  return { url: body.url, secret: body.secret, ...(body.retryDelaysMs ? { retryDelaysMs: body.retryDelaysMs } : {}) };
}

/** The test shortcut's answer: what the page would have done, as JSON. */
function answerJson(res: Response, outcome: PayOutcome): void {
  switch (outcome.kind) {
    case 'missing':
      return problem(res, 404, 'resource_missing', 'No such checkout session');
    case 'not_open':
      return void res.status(409).json({ paid: false, status: outcome.stored.session.status, error: { code: 'session_not_open', message: `The checkout session is ${outcome.stored.session.status}` } });
    case 'card_error':
      return void res.status(402).json({ paid: false, error: outcome.error });
    case 'paid': {
      const { redirectUrl, paymentIntent, charge, eventId } = outcome;
      return void res.json({ paid: true, redirectUrl, sessionId: outcome.stored.session.id, paymentIntent, charge, eventId });
    }
  }
}

/** Inspection and test controls under `/__fake`: not part of the real API. */
export function createInspectRouter(deps: { store: StripeStore; webhooks: WebhookSender; checkout: CheckoutFlow }): express.Router {
  const { store, webhooks, checkout } = deps;
  const inspect = express.Router();
  inspect.use(express.json({ limit: '64kb' }));
  inspect.get('/requests', (_req, res) => void res.json(store.requests()));
  inspect.get('/sessions', (_req, res) => void res.json(store.sessions().map((stored) => stored.session)));
  inspect.post('/sessions/:id/pay', (req, res) => {
    const body = (req.body ?? {}) as Json;
    if (typeof body.card !== 'string') return problem(res, 400, 'validation_failed', 'card must be a card number string');
    const text = (key: string) => (typeof body[key] === 'string' ? body[key] : undefined);
    answerJson(res, checkout.pay(req.params.id, { number: body.card, expiry: text('expiry'), cvc: text('cvc'), name: text('name') }));
  });
  inspect.get('/events', (req, res) => {
    const type = typeof req.query.type === 'string' ? req.query.type : undefined;
    res.json(webhooks.events().filter((record) => type === undefined || record.event.type === type));
  });
  inspect.get('/events/:id', (req, res) => {
    const record = webhooks.find(req.params.id);
    if (record) return void res.json(record);
    problem(res, 404, 'resource_missing', `No such event: ${req.params.id}`);
  });
  inspect.post('/events/:id/resend', (req, res) => {
    if (!webhooks.endpoint()) return problem(res, 409, 'no_webhook_endpoint', 'No webhook endpoint is configured');
    const record = webhooks.resend(req.params.id);
    if (record) return void res.status(202).json(record);
    problem(res, 404, 'resource_missing', `No such event: ${req.params.id}`);
  });
  inspect.get('/webhook-endpoint', (_req, res) => void res.json(webhooks.endpoint()));
  inspect.post('/webhook-endpoint', (req, res) => {
    const endpoint = parseEndpoint((req.body ?? {}) as Json);
    if (typeof endpoint === 'string') return problem(res, 400, 'validation_failed', endpoint);
    webhooks.configure(endpoint);
    res.json(webhooks.endpoint());
  });
  inspect.delete('/webhook-endpoint', (_req, res) => {
    webhooks.configure(null);
    res.status(204).end();
  });
  return inspect;
}
