import type { DataSource } from 'typeorm';
import type { Campaign as CampaignDto, CampaignPage, CreateCampaignBody, DonorWallEntry, ManagedCampaign, UpdateCampaignBody } from '../../shared/schemas/campaign.schema.js';
import { Campaign } from '../db/entities/campaign.entity.js';
import { Donation } from '../db/entities/donation.entity.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { localDate } from '../domain/tide/time-zone.js';
import { NotFoundError, ValidationError } from '../errors.js';

interface Progress {
  trees: number;
  giftCents: number;
  count: number;
}
const NO_PROGRESS: Progress = { trees: 0, giftCents: 0, count: 0 };
const WALL_SIZE = 50;

/** Open: active, and today (in the organisation's zone) between its first and last day. */
export const isOpen = (c: Pick<Campaign, 'active' | 'startsOn' | 'endsOn'>, today: string) =>
  c.active && c.startsOn <= today && (c.endsOn === null || today <= c.endsOn);

function toDto(c: Campaign, p: Progress, today: string): CampaignDto {
  const { id, name, story, priceCents, goalTrees, startsOn, endsOn, active } = c;
  return { id, name, story, priceCents, goalTrees, startsOn, endsOn, active, open: isOpen(c, today), sponsoredTrees: p.trees };
}

const toManaged = (c: Campaign, p: Progress, today: string): ManagedCampaign =>
  ({ ...toDto(c, p, today), raisedCents: p.giftCents, donationCount: p.count, createdAt: c.createdAt.toISOString() });

/** Sponsor-a-tree campaigns: the public pages with progress and donor wall, and admin editing. */
export function createCampaignService(deps: { db: DataSource; clock: () => Date }) {
  const repo = deps.db.getRepository(Campaign);
  const organisation = () => deps.db.getRepository(Organisation).findOneByOrFail({ id: 1 });
  const today = async () => localDate(deps.clock().getTime(), (await organisation()).timeZone);

  /** Paid (not refunded) donations per campaign. */
  async function progress(ids: string[]): Promise<Map<string, Progress>> {
    if (ids.length === 0) return new Map();
    const rows: { id: string; trees: string; gift: string; n: string }[] = await deps.db
      .getRepository(Donation)
      .createQueryBuilder('d')
      .select('d.campaign_id', 'id')
      .addSelect('COALESCE(SUM(d.tree_count), 0)', 'trees')
      .addSelect('COALESCE(SUM(d.gift_cents), 0)', 'gift')
      .addSelect('COUNT(*)', 'n')
      .where('d.status = :paid AND d.campaign_id IN (:...ids)', { paid: 'paid', ids })
      .groupBy('d.campaign_id')
      .getRawMany();
    return new Map(rows.map((r) => [r.id, { trees: Number(r.trees), giftCents: Number(r.gift), count: Number(r.n) }]));
  }

  async function wall(campaignId: string, timeZone: string): Promise<DonorWallEntry[]> {
    const rows = await deps.db.getRepository(Donation).createQueryBuilder('d')
      .where('d.campaign_id = :campaignId AND d.status = :paid AND d.wall_name IS NOT NULL', { campaignId, paid: 'paid' })
      .orderBy('d.paid_at', 'DESC').addOrderBy('d.id', 'ASC').limit(WALL_SIZE).getMany();
    return rows.map((d) => ({ name: d.wallName?.trim() || 'Anonymous', trees: d.treeCount, date: localDate(d.paidAt.getTime(), timeZone) }));
  }

  async function get(id: string): Promise<Campaign> {
    const c = await repo.findOneBy({ id });
    if (!c) throw new NotFoundError('Campaign');
    return c;
  }

  async function managed(c: Campaign, day: string): Promise<ManagedCampaign> {
    return toManaged(c, (await progress([c.id])).get(c.id) ?? NO_PROGRESS, day);
  }

  return {
    get,
    /** Open campaigns, the most recently started first. */
    async listOpen(): Promise<CampaignDto[]> {
      const day = await today();
      const open = (await repo.find({ where: { active: true }, order: { startsOn: 'DESC', name: 'ASC' } })).filter((c) => isOpen(c, day));
      const p = await progress(open.map((c) => c.id));
      return open.map((c) => toDto(c, p.get(c.id) ?? NO_PROGRESS, day));
    },

    /** The public page; an inactive campaign is visible to admins only. A closed one still shows, with `open: false`. */
    async page(id: string, isAdmin: boolean): Promise<CampaignPage> {
      const c = await get(id);
      if (!c.active && !isAdmin) throw new NotFoundError('Campaign');
      const org = await organisation();
      const day = localDate(deps.clock().getTime(), org.timeZone);
      const p = (await progress([c.id])).get(c.id) ?? NO_PROGRESS;
      return { campaign: toDto(c, p, day), sponsoredTrees: p.trees, wall: await wall(c.id, org.timeZone), currency: org.currency, givingRules: org.givingRules };
    },

    async listAll(): Promise<ManagedCampaign[]> {
      const day = await today();
      const all = await repo.find({ order: { startsOn: 'DESC', name: 'ASC' } });
      const p = await progress(all.map((c) => c.id));
      return all.map((c) => toManaged(c, p.get(c.id) ?? NO_PROGRESS, day));
    },

    async create(body: CreateCampaignBody): Promise<ManagedCampaign> {
      return managed(await repo.save(repo.create(body)), await today());
    },

    async update(id: string, body: UpdateCampaignBody): Promise<ManagedCampaign> {
      const c = repo.merge(await get(id), body);
      if (c.endsOn !== null && c.endsOn < c.startsOn) throw new ValidationError('The campaign is invalid', { endsOn: ['must be on or after the start'] });
      return managed(await repo.save(c), await today());
    },
  };
}
export type CampaignService = ReturnType<typeof createCampaignService>;
