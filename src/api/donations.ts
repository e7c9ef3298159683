import {
  CheckoutResult,
  DonationList,
  DonationThanks,
  RefundResult,
  type CheckoutBody,
  type DonationRow,
  type DonationStatus,
} from '@shared/schemas/donation.schema';
import { get, post, queryString } from './http';

export type { CheckoutBody, CheckoutResult, DonationList, DonationRow, DonationStatus, DonationThanks };
export type DonationTotals = DonationList['totals'];

/** Anyone: opens a hosted checkout for the gift; the browser goes to `checkoutUrl` next. */
export function startCheckout(body: CheckoutBody): Promise<CheckoutResult> {
  return post('/api/donations/checkout', body, CheckoutResult);
}

/** Anyone holding the checkout session id (it arrives in the return URL); `recorded` once the payment's webhook landed. */
export function fetchThanks(sessionId: string): Promise<DonationThanks> {
  return get(`/api/donations/thanks/${encodeURIComponent(sessionId)}`, DonationThanks);
}

export interface DonationQuery {
  from: string;
  to: string;
  campaignId: string;
  status: DonationStatus | '';
  q: string;
  page: number;
  pageSize: number;
}

function filterParams(query: DonationQuery): Record<string, string> {
  const { from, to, campaignId, status, q } = query;
  return { from, to, campaignId, status, q: q.trim() };
}

/** Admins: one page of donations with the totals of everything the filters match. */
export function listDonations(query: DonationQuery): Promise<DonationList> {
  const params = { ...filterParams(query), page: String(query.page), pageSize: String(query.pageSize) };
  return get(`/api/donations${queryString(params)}`, DonationList);
}

/** Admins: the same filters as a CSV download (a plain link, so the browser saves the file). */
export function donationsCsvPath(query: DonationQuery): string {
  return `/api/donations/export.csv${queryString(filterParams(query))}`;
}

/**
 * Admins: asks the payment provider to refund the whole payment. Its `charge.refunded` webhook
 * then marks the gift refunded and releases its trees, so the row may change a moment later.
 */
export function refundDonation(id: string): Promise<RefundResult> {
  return post(`/api/donations/${encodeURIComponent(id)}/refund`, {}, RefundResult);
}
