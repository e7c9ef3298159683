import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import { CheckoutBody, DonationIdParams, ListDonationsQuery, ThanksParams } from '../../shared/schemas/donation.schema.js';
import { AppError } from '../errors.js';
import { requireRole } from '../middleware/auth.js';
import type { DonationAdminService } from '../services/donation-admin.service.js';
import type { DonationCheckoutService } from '../services/donation-checkout.service.js';

const perAddress = (windowMs: number, limit: number, message: string) =>
  rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new AppError(429, 'rate_limited', message)),
  });

/** Checkouts need no account, so they are limited per address like registrations: 100 an hour. */
const checkoutLimiter = () => perAddress(60 * 60_000, 100, 'Too many checkouts from this address; try again later');

/**
 * The thank-you page asks up to 20 times a visit. A session not recorded yet is looked up at the
 * payments service, so a flood of made-up ids is cut off before it can use up the account's API
 * rate and stall real checkouts: 300 look-ups in 15 minutes per address.
 */
const thanksLimiter = () => perAddress(15 * 60_000, 300, 'Too many look-ups from this address; try again later');

/** `/api/donations`: donors check out and see their thank-you; admins list, export and refund. */
export function donationRouter(deps: { checkout: DonationCheckoutService; admin: DonationAdminService }): Router {
  const r = Router();
  const admin = requireRole('admin');

  r.post('/checkout', checkoutLimiter(), async (req, res) => {
    res.status(201).json(await deps.checkout.checkout(CheckoutBody.parse(req.body), req.get('idempotency-key')));
  });
  r.get('/thanks/:sessionId', thanksLimiter(), async (req, res) => {
    res.json(await deps.checkout.thanks(ThanksParams.parse(req.params).sessionId));
  });
  r.get('/', admin, async (req, res) => {
    res.json(await deps.admin.list(ListDonationsQuery.parse(req.query)));
  });
  r.get('/export.csv', admin, async (req, res) => {
    const csv = await deps.admin.csv(ListDonationsQuery.parse(req.query));
    res.attachment('donations.csv').type('text/csv').send(csv);
  });
  r.post('/:id/refund', admin, async (req, res) => {
    res.status(202).json(await deps.admin.refund(DonationIdParams.parse(req.params).id));
  });
  return r;
}
