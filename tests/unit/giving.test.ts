import { describe, expect, it } from 'vitest';
import { checkoutLines, giftLineName } from '../../server/domain/giving/checkout-lines.js';
import { giftMetadata, readGiftMetadata, recordedAmounts, type GiftDetails } from '../../server/domain/giving/checkout-metadata.js';
import { donationsCsv } from '../../server/domain/giving/donations-csv.js';
import { decimalAmount, formatMoney } from '../../server/domain/giving/money.js';
import { tideLine } from '../../server/domain/giving/planted-mail.js';
import { NO_GOODS_OR_SERVICES, receiptMail, type ReceiptDonation } from '../../server/domain/giving/receipt-mail.js';
import type { DonationRow } from '../../shared/schemas/donation.schema.js';

const gift: GiftDetails = {
  campaignId: '0b7e4f5e-1111-4111-8111-111111111111', treeCount: 2, giftCents: 5000, feeCoverCents: 181, donorName: 'Ana Lima', donorEmail: 'ana@example.com',
  wallName: 'Ana L.', wantsUpdates: true, dedication: { kind: 'honour', name: 'Teo' },
};

describe('money', () => {
  it.each([
    [10_330, 'usd', '103.30', '$103.30'],
    [5, 'usd', '0.05', '$0.05'],
    [0, 'usd', '0.00', '$0.00'],
    [1500, 'jpy', '1500', '¥1,500'],
  ])('%i minor units of %s read %s and %s', (minor, currency, decimal, formatted) => {
    expect(decimalAmount(minor, currency)).toBe(decimal);
    expect(formatMoney(minor, currency)).toBe(formatted);
  });
});

describe('checkout metadata', () => {
  it('carries the gift through the payments service as strings and back', () => {
    const meta = giftMetadata(gift);
    expect(Object.values(meta).every((v) => typeof v === 'string')).toBe(true);
    expect(readGiftMetadata(meta)).toEqual(gift);
  });

  it.each([
    [null, 'off'],
    ['', 'anonymous'],
    ['Ana L.', 'named'],
  ])('keeps the donor-wall choice %j apart from a missing value', (wallName, wall) => {
    const meta = giftMetadata({ ...gift, wallName });
    expect(meta.wall).toBe(wall);
    expect(readGiftMetadata(meta)!.wallName).toBe(wallName);
  });

  it('ignores sessions not made by the donate form', () => {
    expect(readGiftMetadata({})).toBeNull();
    expect(readGiftMetadata({ ...giftMetadata(gift), kind: 'membership' })).toBeNull();
    expect(readGiftMetadata({ ...giftMetadata(gift), giftCents: '-5' })).toBeNull();
    expect(readGiftMetadata(null)).toBeNull();
  });

  it('records what the card was charged, the gift capped at it and the rest as fee cover', () => {
    expect(recordedAmounts(5181, gift)).toEqual({ amountCents: 5181, giftCents: 5000, feeCoverCents: 181 });
    expect(recordedAmounts(4000, gift)).toEqual({ amountCents: 4000, giftCents: 4000, feeCoverCents: 0 });
  });
});

describe('checkout lines', () => {
  it('names the gift after its trees and puts the fee cover on its own line', () => {
    const quote = { giftCents: 5000, feeCoverCents: 181, totalCents: 5181, treeCount: 2 };
    expect(checkoutLines({ quote, currency: 'usd', campaignName: 'North cove', organisationName: 'Org' })).toEqual([
      { quantity: 1, price_data: { currency: 'usd', unit_amount: 5000, product_data: { name: 'Sponsor 2 trees — North cove' } } },
      { quantity: 1, price_data: { currency: 'usd', unit_amount: 181, product_data: { name: 'Card fee cover' } } },
    ]);
    expect(checkoutLines({ quote: { ...quote, feeCoverCents: 0, totalCents: 5000 }, currency: 'usd', campaignName: null, organisationName: 'Org' })).toHaveLength(1);
    expect(giftLineName(1, 'North cove', 'Org')).toBe('Sponsor 1 tree — North cove');
    expect(giftLineName(0, null, 'Org')).toBe('Gift to Org');
  });
});

describe('receipt mail', () => {
  const donation: ReceiptDonation = {
    id: 'd-1', donorName: 'Ana Lima', amountCents: 5181, giftCents: 5000, feeCoverCents: 181, currency: 'usd', paidAt: new Date('2026-03-14T15:00:00Z'),
    treeCount: 2, treeTags: ['T-0002', 'T-0001'], campaignName: 'North cove', dedication: null,
  };
  const link = { href: 'https://ebbroot.example/sponsor/thanks?session_id=cs_1', label: 'See your gift' };

  it('falls back to the organisation name without a legal name and leaves out an empty tax id', () => {
    const mail = receiptMail(donation, { name: 'Bay Org', legalName: ' ', taxId: '', timeZone: 'America/New_York' }, link);
    expect(mail.text).toContain('Received by: Bay Org');
    expect(mail.text).not.toContain('Tax ID');
    expect(mail.text).toContain(NO_GOODS_OR_SERVICES);
    expect(mail.html).toContain(NO_GOODS_OR_SERVICES);
  });

  it('says the date in the organisation\'s zone and escapes names in the HTML', () => {
    const late = { ...donation, paidAt: new Date('2026-03-15T02:00:00Z'), donorName: '<Ana>' };
    const mail = receiptMail(late, { name: 'Bay Org', legalName: 'Bay Org Inc.', taxId: '00-0000000', timeZone: 'America/New_York' }, link);
    expect(mail.text).toContain('Date: Saturday, March 14, 2026');
    expect(mail.html).toContain('&lt;Ana&gt;');
    expect(mail.html).not.toContain('<Ana>');
  });

  it('tells a donor when none of the trees could be matched yet', () => {
    const mail = receiptMail({ ...donation, treeTags: [] }, { name: 'Bay Org', legalName: '', taxId: '', timeZone: 'UTC' }, link);
    expect(mail.text).toContain('None of your 2 trees is matched to a nursery tree yet');
    expect(mail.text).toContain('Trees sponsored: 2 trees, to be matched');
  });
});

describe('donations CSV', () => {
  const row: DonationRow = {
    id: 'd-1', amountCents: 5181, giftCents: 5000, feeCoverCents: 181, currency: 'usd', status: 'paid', checkoutSessionId: 'cs_1',
    donor: { name: 'Ana Lima', email: 'ana@example.com' }, treeCount: 0, trees: [], campaign: null, dedication: null, wallName: null,
    wantsUpdates: false, paidAt: '2026-03-14T15:00:00.000Z', refundedAt: null, createdAt: '2026-03-14T15:00:00.000Z',
  };
  const cells = (donor: DonationRow['donor']) => donationsCsv([{ ...row, donor }]).split('\r\n')[1]!;

  it.each([
    // Donor-typed text that a spreadsheet would run as a formula (OWASP, "CSV Injection": = + - @ tab CR).
    [{ name: '=HYPERLINK("http://x")', email: 'a@example.com' }, `"'=HYPERLINK(""http://x"")"`],
    [{ name: 'Ana', email: '+1@example.com' }, "'+1@example.com"],
    [{ name: '@SUM(A1)', email: 'a@example.com' }, "'@SUM(A1)"],
    [{ name: '\t=1+1', email: 'a@example.com' }, "'\t=1+1"],
    [{ name: '\r=1+1', email: 'a@example.com' }, `"'\r=1+1"`],
  ])('neutralises a leading formula character in %j', (donor, cell) => {
    expect(cells(donor)).toContain(`,${cell},`);
  });
});

describe('tide line of the planted news', () => {
  it('reads a low below the datum with a minus sign, in the site\'s zone', () => {
    expect(tideLine({ timeMs: Date.parse('2026-01-10T12:05:00Z'), height: -0.34, type: 'low' }, 'America/New_York', 'ft')).toBe('Low 7:05 AM EST, −0.3 ft');
    expect(tideLine({ timeMs: Date.parse('2026-07-10T18:40:00Z'), height: 0.7, type: 'high' }, 'America/New_York', 'm')).toBe('High 2:40 PM EDT, 0.7 m');
  });
});
