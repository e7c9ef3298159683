import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { CollectionBatch } from './collection-batch.entity.js';
import { Donation } from './donation.entity.js';
import { Site } from './site.entity.js';
import { Tank } from './tank.entity.js';
import { Workday } from './workday.entity.js';
import type { TreeStage } from '../../../shared/schemas/nursery.schema.js';

/** A nursery tree with its printed tag; its history is in tree_event. */
@Entity({ name: 'tree' })
export class Tree {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 20, unique: true })
  tag: string;

  @Index()
  @Column({ type: 'uuid', name: 'batch_id', nullable: true })
  batchId: string | null;

  @ManyToOne(() => CollectionBatch, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'batch_id' })
  batch: Relation<CollectionBatch> | null;

  @Index()
  @Column({ type: 'varchar', length: 12, default: 'collected' })
  stage: TreeStage;

  @Index()
  @Column({ type: 'uuid', name: 'tank_id', nullable: true })
  tankId: string | null;

  @ManyToOne(() => Tank, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'tank_id' })
  tank: Relation<Tank> | null;

  @Column({ type: 'double precision', name: 'pot_height_cm', nullable: true })
  potHeightCm: number | null;

  @Column({ type: 'double precision', name: 'pot_mass_kg', nullable: true })
  potMassKg: number | null;

  /** Latest measured height above the pot's top, cm. */
  @Column({ type: 'double precision', name: 'height_cm', nullable: true })
  heightCm: number | null;

  @Column({ type: 'integer', name: 'leaf_count', nullable: true })
  leafCount: number | null;

  @Column({ type: 'boolean', default: true })
  healthy: boolean;

  @Index()
  @Column({ type: 'uuid', name: 'reserved_workday_id', nullable: true })
  reservedWorkdayId: string | null;

  @ManyToOne(() => Workday, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'reserved_workday_id' })
  reservedWorkday: Relation<Workday> | null;

  /** Where and when it was planted out. */
  @Index()
  @Column({ type: 'uuid', name: 'site_id', nullable: true })
  siteId: string | null;

  @ManyToOne(() => Site, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'site_id' })
  site: Relation<Site> | null;

  @Column({ type: 'date', name: 'planted_on', nullable: true })
  plantedOn: string | null;

  /** Bed elevation where it was planted, metres above the site station's MLLW. */
  @Column({ type: 'double precision', name: 'planted_bed_elevation_m', nullable: true })
  plantedBedElevationM: number | null;

  /** The planting workday that put it in the ground, when there was one. */
  @Index()
  @Column({ type: 'uuid', name: 'planted_workday_id', nullable: true })
  plantedWorkdayId: string | null;

  @ManyToOne(() => Workday, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'planted_workday_id' })
  plantedWorkday: Relation<Workday> | null;

  /** The gift that sponsors this tree (one tree, one sponsor); released on refund. */
  @Index()
  @Column({ type: 'uuid', name: 'sponsor_donation_id', nullable: true })
  sponsorDonationId: string | null;

  @ManyToOne(() => Donation, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'sponsor_donation_id' })
  sponsorDonation: Relation<Donation> | null;

  /** When the sponsor was told it was planted, so the news goes out once. */
  @Column({ type: 'timestamptz', name: 'sponsor_told_planted_at', nullable: true })
  sponsorToldPlantedAt: Date | null;

  @Column({ type: 'uuid', name: 'photo_id', nullable: true })
  photoId: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
