import express, { Router } from 'express';
import type { DonationWebhookService } from '../services/donation-webhook.service.js';

/**
 * `POST /api/webhooks/stripe`: payment events. Mounted before the JSON parser, the session and
 * CSRF: the signature is computed over the exact bytes sent, and the sender has no session.
 */
export function stripeWebhookRouter(deps: { webhooks: DonationWebhookService }): Router {
  const r = Router();
  r.post('/', express.raw({ type: () => true, limit: '1mb' }), async (req, res) => {
    const raw = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    const { type, outcome } = await deps.webhooks.handle(raw, req.get('stripe-signature'));
    res.json({ received: true, type, outcome });
  });
  return r;
}
