/** Sponsor-a-tree wiring: campaigns, checkout, webhooks and the admin's donations, over one payments client. */
import { createPayments, type Payments } from '../adapters/payments.js';
import { createCampaignService } from './campaign.service.js';
import { createDonationAdminService } from './donation-admin.service.js';
import { createDonationCheckoutService } from './donation-checkout.service.js';
import { createDonationWebhookService } from './donation-webhook.service.js';
import type { ServiceDeps } from './index.js';

export function createGivingServices(deps: ServiceDeps & { payments?: Payments }) {
  const { config, db, clock, log } = deps;
  const payments = deps.payments ?? createPayments({ secretKey: config.STRIPE_SECRET_KEY, webhookSecret: config.STRIPE_WEBHOOK_SECRET, apiUrl: config.STRIPE_API_URL });
  return {
    campaigns: createCampaignService({ db, clock }),
    donationCheckout: createDonationCheckoutService({ db, payments, clock, appUrl: config.APP_URL }),
    donationAdmin: createDonationAdminService({ db, payments }),
    donationWebhooks: createDonationWebhookService({ db, payments, clock, appUrl: config.APP_URL, log, flush: () => deps.notifier.flush() }),
  };
}
