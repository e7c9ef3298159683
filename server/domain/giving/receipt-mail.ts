/**
 * The donation receipt e-mail; pure (the caller passes the donation, the organisation and the
 * links). It holds what a written acknowledgment of a gift needs: who received it (legal name
 * and tax id), the date, the amount, and the statement that nothing was given in return.
 */
import { mailLayout, type MailContent } from '../mail-layout.js';
import { longDate } from '../workday-time.js';
import { formatMoney, treesWord } from './money.js';

/**
 * US practice for a contribution receipt when the donor received nothing in return (IRS
 * Publication 1771, "Charitable Contributions — Substantiation and Disclosure Requirements";
 * wording from memory).
 */
export const NO_GOODS_OR_SERVICES = 'No goods or services were provided in exchange for this contribution.';

export interface ReceiptDonation {
  id: string;
  donorName: string;
  amountCents: number;
  giftCents: number;
  feeCoverCents: number;
  currency: string;
  paidAt: Date;
  treeCount: number;
  /** Tags of the nursery trees linked now (may be fewer than treeCount while the nursery is short). */
  treeTags: string[];
  campaignName: string | null;
  dedication: { kind: 'honour' | 'memory'; name: string } | null;
}

export interface ReceiptOrganisation {
  name: string;
  legalName: string;
  taxId: string;
  timeZone: string;
}

export const dedicationText = (d: { kind: 'honour' | 'memory'; name: string }) => `${d.kind === 'honour' ? 'In honour of' : 'In memory of'} ${d.name}`;

function intro(d: ReceiptDonation, orgName: string): string[] {
  const what = d.treeCount > 0 ? `sponsoring ${treesWord(d.treeCount)}${d.campaignName ? ` through ${d.campaignName}` : ''}` : `your gift to ${d.campaignName ?? orgName}`;
  const lines = [`Thank you for ${what}. This e-mail is your receipt; please keep it for your records.`];
  const waiting = d.treeCount - d.treeTags.length;
  if (d.treeCount > 0 && waiting > 0) {
    const linked = d.treeTags.length;
    lines.push(linked === 0
      ? `None of your ${treesWord(d.treeCount)} is matched to a nursery tree yet; they will be matched as new propagules come into the nursery.`
      : `So far ${linked} of your ${treesWord(d.treeCount)} ${linked === 1 ? 'is' : 'are'} matched to nursery trees; the other ${waiting} will be matched as new propagules come into the nursery.`);
  }
  if (d.treeCount > 0) {
    lines.push('Each tree grows in the volunteer nursery until it is ready to plant out on the shoreline. When one of your trees is planted, we will e-mail you the site, the date and that day\'s tide.');
  }
  return lines;
}

function details(d: ReceiptDonation, org: ReceiptOrganisation): [string, string][] {
  const rows: [string, string][] = [
    ['Receipt number', d.id],
    ['Date', longDate(d.paidAt, org.timeZone)],
    ['Amount', formatMoney(d.amountCents, d.currency)],
  ];
  if (d.feeCoverCents > 0) rows.push(['Of which', `${formatMoney(d.giftCents, d.currency)} gift + ${formatMoney(d.feeCoverCents, d.currency)} to cover the card fee`]);
  if (d.campaignName) rows.push(['Campaign', d.campaignName]);
  if (d.treeCount > 0) rows.push(['Trees sponsored', d.treeTags.length ? `${d.treeTags.join(', ')}` : `${treesWord(d.treeCount)}, to be matched`]);
  if (d.dedication) rows.push(['Dedication', dedicationText(d.dedication)]);
  rows.push(['Donor', d.donorName]);
  rows.push(['Received by', org.legalName.trim() || org.name]);
  if (org.taxId.trim()) rows.push(['Tax ID', org.taxId.trim()]);
  return rows;
}

/** The receipt for one paid donation. */
export function receiptMail(d: ReceiptDonation, org: ReceiptOrganisation, link: { href: string; label: string }): MailContent {
  const greeting = `Hello ${d.donorName},`;
  const lines = intro(d, org.name);
  const rows = details(d, org);
  const signature = `${org.name} · Ebbroot`;
  const text = [greeting, lines.join('\n\n'), rows.map(([k, v]) => `${k}: ${v}`).join('\n'), NO_GOODS_OR_SERVICES, `${link.label}: ${link.href}`, signature].join('\n\n');
  const html = mailLayout({ greeting, lines, details: rows, notes: [NO_GOODS_OR_SERVICES], link, signature });
  const subject = `Your receipt: ${formatMoney(d.amountCents, d.currency)} to ${org.name}`.slice(0, 300);
  return { subject, text: `${text}\n`, html };
}
