import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { CollectionBatch } from './collection-batch.entity.js';
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

  @Column({ type: 'uuid', name: 'photo_id', nullable: true })
  photoId: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
