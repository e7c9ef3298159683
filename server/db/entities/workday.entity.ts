import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { WorkdayKind, WorkdayStatus } from '../../../shared/schemas/workday.schema.js';
import { Site } from './site.entity.js';
import { User } from './user.entity.js';

/** A scheduled day of work at a site. */
@Entity({ name: 'workday' })
@Check('CHK_workday_kind', `"kind" IN ('planting', 'nursery', 'monitoring', 'other')`)
@Check('CHK_workday_status', `"status" IN ('draft', 'published', 'cancelled', 'completed')`)
@Check('CHK_workday_span', `"ends_at" > "starts_at"`)
export class Workday {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ type: 'varchar', length: 20, default: 'planting' })
  kind: WorkdayKind;

  @Index()
  @Column({ type: 'uuid', name: 'site_id' })
  siteId: string;

  @ManyToOne(() => Site, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'site_id' })
  site: Relation<Site>;

  @Index()
  @Column({ type: 'timestamptz', name: 'starts_at' })
  startsAt: Date;

  @Column({ type: 'timestamptz', name: 'ends_at' })
  endsAt: Date;

  @Column({ type: 'varchar', length: 20, default: 'draft' })
  status: WorkdayStatus;

  @Column({ type: 'uuid', name: 'created_by_id', nullable: true })
  createdById: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id' })
  createdBy: Relation<User> | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
