/** The admin's view of donations: filtered, paged list with totals, CSV export, and refunds. */
import { In, type DataSource, type SelectQueryBuilder } from 'typeorm';
import type { DonationList, DonationRow, ListDonationsQuery, RefundResult } from '../../shared/schemas/donation.schema.js';
import { PaymentRefusedError, type Payments } from '../adapters/payments.js';
import { Donation } from '../db/entities/donation.entity.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { donationsCsv } from '../domain/giving/donations-csv.js';
import { ConflictError, NotFoundError } from '../errors.js';

type Filters = Omit<ListDonationsQuery, 'page' | 'pageSize'>;
const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);
/** The export is one file; beyond this many rows, narrow the dates. */
const CSV_MAX_ROWS = 50_000;

function toRow(d: Donation, trees: Tree[]): DonationRow {
  return {
    id: d.id,
    amountCents: d.amountCents,
    giftCents: d.giftCents,
    feeCoverCents: d.feeCoverCents,
    currency: d.currency,
    status: d.status,
    checkoutSessionId: d.checkoutSessionId,
    donor: { name: d.donorName, email: d.donorEmail },
    treeCount: d.treeCount,
    trees: trees.map((t) => ({ id: t.id, tag: t.tag, stage: t.stage })),
    campaign: d.campaign ? { id: d.campaign.id, name: d.campaign.name } : null,
    dedication: d.dedicationKind && d.dedicationName ? { kind: d.dedicationKind, name: d.dedicationName } : null,
    wallName: d.wallName,
    wantsUpdates: d.wantsUpdates,
    paidAt: d.paidAt.toISOString(),
    refundedAt: d.refundedAt?.toISOString() ?? null,
    createdAt: d.createdAt.toISOString(),
  };
}

export function createDonationAdminService(deps: { db: DataSource; payments: Payments }) {
  const repo = deps.db.getRepository(Donation);

  /** Filters on the day paid in the organisation's zone, campaign, status and donor text. */
  async function filtered(f: Filters): Promise<SelectQueryBuilder<Donation>> {
    const { timeZone } = await deps.db.getRepository(Organisation).findOneByOrFail({ id: 1 });
    const qb = repo.createQueryBuilder('d');
    const day = '(d.paid_at AT TIME ZONE :tz)::date';
    if (f.from) qb.andWhere(`${day} >= :from`, { tz: timeZone, from: f.from });
    if (f.to) qb.andWhere(`${day} <= :to`, { tz: timeZone, to: f.to });
    if (f.campaignId) qb.andWhere('d.campaign_id = :campaignId', { campaignId: f.campaignId });
    if (f.status) qb.andWhere('d.status = :status', { status: f.status });
    if (f.q) qb.andWhere('(d.donor_name ILIKE :q OR d.donor_email ILIKE :q OR d.checkout_session_id ILIKE :q)', { q: `%${likeEscape(f.q)}%` });
    return qb;
  }

  async function withTrees(donations: Donation[]): Promise<DonationRow[]> {
    const ids = donations.map((d) => d.id);
    const trees = ids.length ? await deps.db.getRepository(Tree).find({ where: { sponsorDonationId: In(ids) }, select: { id: true, tag: true, stage: true, sponsorDonationId: true }, order: { tag: 'ASC' } }) : [];
    const byDonation = new Map<string, Tree[]>();
    for (const t of trees) byDonation.set(t.sponsorDonationId ?? '', [...(byDonation.get(t.sponsorDonationId ?? '') ?? []), t]);
    return donations.map((d) => toRow(d, byDonation.get(d.id) ?? []));
  }

  const newestFirst = (qb: SelectQueryBuilder<Donation>) => qb.leftJoinAndSelect('d.campaign', 'c').orderBy('d.paid_at', 'DESC').addOrderBy('d.id', 'ASC');

  return {
    async list(q: ListDonationsQuery): Promise<DonationList> {
      const totalsRow: { n: string; amount: string; gift: string; cover: string } | undefined = await (await filtered(q))
        .select('COUNT(*)', 'n')
        .addSelect('COALESCE(SUM(d.amount_cents), 0)', 'amount')
        .addSelect('COALESCE(SUM(d.gift_cents), 0)', 'gift')
        .addSelect('COALESCE(SUM(d.fee_cover_cents), 0)', 'cover')
        .getRawOne();
      const page = await newestFirst(await filtered(q)).skip((q.page - 1) * q.pageSize).take(q.pageSize).getMany();
      const count = Number(totalsRow?.n ?? 0);
      return {
        items: await withTrees(page),
        total: count,
        totals: { amountCents: Number(totalsRow?.amount ?? 0), giftCents: Number(totalsRow?.gift ?? 0), feeCoverCents: Number(totalsRow?.cover ?? 0), count },
      };
    },

    async csv(f: Filters): Promise<string> {
      const rows = await newestFirst(await filtered(f)).take(CSV_MAX_ROWS).getMany();
      return donationsCsv(await withTrees(rows));
    },

    /** Asks the payments service to refund in full; the `charge.refunded` webhook then marks it refunded. */
    async refund(id: string): Promise<RefundResult> {
      const d = await repo.findOneBy({ id });
      if (!d) throw new NotFoundError('Donation');
      if (d.status === 'refunded') throw new ConflictError('This donation is refunded already');
      if (!d.paymentIntentId) throw new ConflictError('This donation has no payment to refund');
      try {
        const refund = await deps.payments.refundPaymentIntent(d.paymentIntentId, `donation-refund:${d.id}`);
        return { refundId: refund.id, status: refund.status };
      } catch (err) {
        // E.g. refunded from the payments dashboard already; its charge.refunded webhook marks the gift.
        if (err instanceof PaymentRefusedError) throw new ConflictError(`The payments service refused the refund: ${err.message}`);
        throw err;
      }
    },
  };
}
export type DonationAdminService = ReturnType<typeof createDonationAdminService>;
