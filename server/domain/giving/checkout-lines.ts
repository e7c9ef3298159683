/** The lines a donor sees on the hosted checkout page; pure. */
import type { DonationQuote } from '../../../shared/domain/fee-cover.js';
import { treesWord } from './money.js';

export interface CheckoutLine {
  quantity: number;
  price_data: { currency: string; unit_amount: number; product_data: { name: string } };
}

/** "Sponsor 2 trees — Heron Reach 2026"; a gift of no whole tree reads "Gift to …". */
export function giftLineName(treeCount: number, campaignName: string | null, organisationName: string): string {
  if (treeCount === 0) return `Gift to ${campaignName ?? organisationName}`;
  return campaignName ? `Sponsor ${treesWord(treeCount)} — ${campaignName}` : `Sponsor ${treesWord(treeCount)}`;
}

/**
 * The gift as one line named after its trees and, when chosen, a separate "Card fee cover"
 * line, so the donor sees exactly what the extra is.
 */
export function checkoutLines(opts: { quote: DonationQuote; currency: string; campaignName: string | null; organisationName: string }): CheckoutLine[] {
  const { quote, currency } = opts;
  const name = giftLineName(quote.treeCount, opts.campaignName, opts.organisationName);
  const gift: CheckoutLine = { quantity: 1, price_data: { currency, unit_amount: quote.giftCents, product_data: { name } } };
  if (quote.feeCoverCents === 0) return [gift];
  return [gift, { quantity: 1, price_data: { currency, unit_amount: quote.feeCoverCents, product_data: { name: 'Card fee cover' } } }];
}
