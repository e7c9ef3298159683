import express, { type Express } from 'express';
import { requestLog, type LogLine } from '../support/request-log.js';
import { createApiRouter } from './api-router.js';
import { createCheckoutFlow } from './checkout-flow.js';
import { createInspectRouter } from './inspect-routes.js';
import { createPayRouter } from './pay-routes.js';
import { createStripeStore, type StripeStore } from './stripe-store.js';
import { createWebhookSender, type WebhookSender } from './webhook-sender.js';

export interface StripeAppOptions {
  log: LogLine;
  /** Where payers reach this fake; known only once the server is bound. */
  baseUrl: () => string;
  store?: StripeStore;
  /** Sends the events; pass one to configure its endpoint and to stop its retries on close. */
  webhooks?: WebhookSender;
}

const nowSeconds = () => Math.floor(Date.now() / 1000);

/**
 * The payments HTTP API at `/v1`, the hosted checkout page at `/pay/:id`, signed webhook
 * events, and inspection and test controls under `/__fake`.
 */
export function createStripeApp(options: StripeAppOptions): Express {
  const store = options.store ?? createStripeStore();
  const webhooks = options.webhooks ?? createWebhookSender({ log: options.log });
  const checkout = createCheckoutFlow({ store, webhooks, now: nowSeconds });
  const app = express();
  app.disable('x-powered-by');
  // The SDK sends list and expand parameters in bracket notation on GET too.
  app.set('query parser', 'extended');
  app.use(requestLog('stripe', options.log));
  // Browsers ask for it on the hosted page; an empty answer keeps their console clean.
  app.get('/favicon.ico', (_req, res) => void res.status(204).end());
  app.use('/v1', createApiRouter({ store, webhooks, checkout, now: nowSeconds, log: options.log, baseUrl: options.baseUrl }));
  app.use(createPayRouter(checkout));
  app.use('/__fake', createInspectRouter({ store, webhooks, checkout }));
  return app;
}
