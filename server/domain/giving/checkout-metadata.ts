/**
 * What a checkout session carries from the donate form to the payment webhook. The payments
 * service keeps metadata as string → string (no null, no nesting), so every value is a string
 * and "off the wall" has its own marker instead of a null. Pure.
 */
import { z } from 'zod';
import type { DedicationKind } from '../../../shared/schemas/donation.schema.js';

/** Marks sessions this app created, so payments of anything else on the account are ignored. */
export const GIFT_KIND = 'sponsor-a-tree';

export interface GiftDetails {
  campaignId: string | null;
  treeCount: number;
  giftCents: number;
  feeCoverCents: number;
  donorName: string;
  donorEmail: string;
  /** null: off the donor wall; '': on it as "Anonymous". */
  wallName: string | null;
  wantsUpdates: boolean;
  dedication: { kind: DedicationKind; name: string } | null;
}

export function giftMetadata(g: GiftDetails): Record<string, string> {
  const wall = g.wallName === null ? 'off' : g.wallName === '' ? 'anonymous' : 'named';
  return {
    kind: GIFT_KIND,
    ...(g.campaignId ? { campaignId: g.campaignId } : {}),
    treeCount: String(g.treeCount),
    giftCents: String(g.giftCents),
    feeCoverCents: String(g.feeCoverCents),
    donorName: g.donorName,
    donorEmail: g.donorEmail,
    wall,
    ...(wall === 'named' && g.wallName ? { wallName: g.wallName } : {}),
    wantsUpdates: g.wantsUpdates ? 'yes' : 'no',
    ...(g.dedication ? { dedicationKind: g.dedication.kind, dedicationName: g.dedication.name } : {}),
  };
}

const count = z.string().regex(/^\d{1,9}$/).transform(Number);
const Metadata = z.object({
  kind: z.literal(GIFT_KIND),
  campaignId: z.uuid().optional(),
  treeCount: count,
  giftCents: count,
  feeCoverCents: count,
  donorName: z.string().min(1).max(120),
  donorEmail: z.string().max(254).default(''),
  wall: z.enum(['off', 'anonymous', 'named']),
  wallName: z.string().max(80).optional(),
  wantsUpdates: z.enum(['yes', 'no']),
  dedicationKind: z.enum(['honour', 'memory']).optional(),
  dedicationName: z.string().min(1).max(120).optional(),
});

/** The gift in a session's metadata, or null when the session is not one of ours (or is malformed). */
export function readGiftMetadata(metadata: Record<string, string> | null | undefined): GiftDetails | null {
  const parsed = Metadata.safeParse(metadata ?? {});
  if (!parsed.success) return null;
  const m = parsed.data;
  return {
    campaignId: m.campaignId ?? null,
    treeCount: m.treeCount,
    giftCents: m.giftCents,
    feeCoverCents: m.feeCoverCents,
    donorName: m.donorName,
    donorEmail: m.donorEmail,
    wallName: m.wall === 'off' ? null : m.wall === 'anonymous' ? '' : (m.wallName ?? ''),
    wantsUpdates: m.wantsUpdates === 'yes',
    dedication: m.dedicationKind && m.dedicationName ? { kind: m.dedicationKind, name: m.dedicationName } : null,
  };
}

/**
 * Amounts to record: what the card was charged is the truth; the gift is what the donor meant,
 * capped at the charge, and whatever is above it is the fee cover. So amount = gift + cover always.
 */
export function recordedAmounts(amountTotal: number, g: Pick<GiftDetails, 'giftCents'>): { amountCents: number; giftCents: number; feeCoverCents: number } {
  const giftCents = Math.min(g.giftCents, amountTotal);
  return { amountCents: amountTotal, giftCents, feeCoverCents: amountTotal - giftCents };
}
