import express, { type Response } from 'express';
import type { CheckoutFlow, PayOutcome } from './checkout-flow.js';
import { renderClosedPage, renderMissingSession, renderPaidPage, renderPayPage } from './pay-page.js';
import type { CardInput } from './test-cards.js';

function cardFromForm(body: unknown): CardInput {
  const form = typeof body === 'object' && body !== null ? (body as Record<string, unknown>) : {};
  const read = (key: string) => (typeof form[key] === 'string' ? form[key] : '');
  return { number: read('card_number'), expiry: read('card_expiry'), cvc: read('card_cvc'), name: read('card_name') };
}

/** Like the hosted page: paid → 303 to the success URL; declined → the page again with the reason. */
function answerPage(res: Response, id: string, outcome: PayOutcome, typed: CardInput): void {
  const html = (status: number, page: string) => void res.status(status).type('html').send(page);
  switch (outcome.kind) {
    case 'missing':
      return html(404, renderMissingSession(id));
    case 'not_open':
      return html(409, renderClosedPage(outcome.stored));
    case 'card_error':
      return html(402, renderPayPage(outcome.stored, { error: outcome.error, typed: { ...typed, cvc: '' } }));
    case 'paid':
      if (outcome.redirectUrl) return void res.redirect(303, outcome.redirectUrl);
      return html(200, renderPaidPage(outcome.stored));
  }
}

/** The hosted checkout page: plain server-rendered HTML and form posts, no script needed. */
export function createPayRouter(checkout: CheckoutFlow): express.Router {
  const pages = express.Router();
  pages.get('/pay/:id', (req, res) => {
    const stored = checkout.lookup(req.params.id);
    if (!stored) return void res.status(404).type('html').send(renderMissingSession(req.params.id));
    const page = stored.session.status === 'open' ? renderPayPage(stored) : renderClosedPage(stored);
    res.type('html').send(page);
  });
  pages.post('/pay/:id', express.urlencoded({ extended: false, limit: '16kb' }), (req, res) => {
    const typed = cardFromForm(req.body);
    answerPage(res, req.params.id, checkout.pay(req.params.id, typed), typed);
  });
  return pages;
}
