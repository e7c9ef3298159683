/** The donation list as CSV for the treasurer's spreadsheet; amounts as decimals of the currency. */
import type { DonationRow } from '../../../shared/schemas/donation.schema.js';
import { csvText } from '../csv.js';
import { decimalAmount } from './money.js';
import { dedicationText } from './receipt-mail.js';

const HEADER = [
  'Paid at', 'Donor', 'E-mail', 'Campaign', 'Trees bought', 'Tree tags', 'Gift', 'Card fee cover', 'Amount', 'Currency', 'Status',
  'Refunded at', 'Dedication', 'Donor wall', 'Wants updates', 'Checkout session', 'Donation id',
];

const wall = (name: string | null) => (name === null ? '' : name === '' ? 'Anonymous' : name);

export function donationsCsv(rows: DonationRow[]): string {
  return csvText(HEADER, rows.map((d) => [
    d.paidAt, d.donor.name, d.donor.email, d.campaign?.name ?? '', d.treeCount, d.trees.map((t) => t.tag).join(' '),
    decimalAmount(d.giftCents, d.currency), decimalAmount(d.feeCoverCents, d.currency), decimalAmount(d.amountCents, d.currency),
    d.currency.toUpperCase(), d.status, d.refundedAt ?? '', d.dedication ? dedicationText(d.dedication) : '', wall(d.wallName),
    d.wantsUpdates ? 'yes' : 'no', d.checkoutSessionId, d.id,
  ]));
}
