import { Check, Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** A sponsor-a-tree appeal: a price per tree toward a goal in trees, open between two dates. */
@Entity({ name: 'campaign' })
@Check('CHK_campaign_amounts', `"price_cents" > 0 AND "goal_trees" > 0`)
export class Campaign {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  /** The appeal shown on the public page (plain text, paragraphs split on blank lines). */
  @Column({ type: 'text', default: '' })
  story: string;

  @Column({ type: 'integer', name: 'price_cents' })
  priceCents: number;

  @Column({ type: 'integer', name: 'goal_trees' })
  goalTrees: number;

  @Column({ type: 'date', name: 'starts_on' })
  startsOn: string;

  @Column({ type: 'date', name: 'ends_on', nullable: true })
  endsOn: string | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
