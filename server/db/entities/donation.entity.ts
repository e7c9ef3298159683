import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Campaign } from './campaign.entity.js';

export type DonationStatus = 'paid' | 'refunded';
export type DedicationKind = 'honour' | 'memory';

/**
 * A gift, written only from a verified payment webhook and at most once per checkout session
 * (unique `checkout_session_id`). Amounts are integer cents in the organisation's currency.
 */
@Entity({ name: 'donation' })
@Check('CHK_donation_amounts', `"amount_cents" > 0 AND "gift_cents" > 0 AND "fee_cover_cents" >= 0 AND "tree_count" >= 0`)
@Check('CHK_donation_status', `"status" IN ('paid', 'refunded')`)
export class Donation {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index()
  @Column({ type: 'uuid', name: 'campaign_id', nullable: true })
  campaignId: string | null;

  @ManyToOne(() => Campaign, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'campaign_id' })
  campaign: Relation<Campaign> | null;

  @Column({ type: 'varchar', length: 255, name: 'checkout_session_id', unique: true })
  checkoutSessionId: string;

  @Index()
  @Column({ type: 'varchar', length: 255, name: 'payment_intent_id', nullable: true })
  paymentIntentId: string | null;

  /** What the donor paid (gift + fee cover). */
  @Column({ type: 'integer', name: 'amount_cents' })
  amountCents: number;

  /** The gift the donor meant the organisation to receive. */
  @Column({ type: 'integer', name: 'gift_cents' })
  giftCents: number;

  /** The part added so the card fee does not eat into the gift (0 when not chosen). */
  @Column({ type: 'integer', name: 'fee_cover_cents', default: 0 })
  feeCoverCents: number;

  @Column({ type: 'varchar', length: 3, default: 'usd' })
  currency: string;

  @Index()
  @Column({ type: 'varchar', length: 10, default: 'paid' })
  status: DonationStatus;

  @Column({ type: 'integer', name: 'tree_count', default: 0 })
  treeCount: number;

  @Column({ type: 'varchar', length: 120, name: 'donor_name' })
  donorName: string;

  @Index()
  @Column({ type: 'varchar', length: 254, name: 'donor_email' })
  donorEmail: string;

  /** Shown on the donor wall; null keeps the gift off the wall, '' shows it as anonymous. */
  @Column({ type: 'varchar', length: 80, name: 'wall_name', nullable: true })
  wallName: string | null;

  @Column({ type: 'boolean', name: 'wants_updates', default: false })
  wantsUpdates: boolean;

  @Column({ type: 'varchar', length: 8, name: 'dedication_kind', nullable: true })
  dedicationKind: DedicationKind | null;

  @Column({ type: 'varchar', length: 120, name: 'dedication_name', nullable: true })
  dedicationName: string | null;

  @Column({ type: 'timestamptz', name: 'paid_at' })
  paidAt: Date;

  @Column({ type: 'timestamptz', name: 'refunded_at', nullable: true })
  refundedAt: Date | null;

  @Column({ type: 'timestamptz', name: 'receipt_sent_at', nullable: true })
  receiptSentAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
