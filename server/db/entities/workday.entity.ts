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

  @Column({ type: 'text', default: '' })
  description: string;

  /** Where the crew meets; the site's launch when empty. */
  @Column({ type: 'varchar', length: 200, name: 'meeting_point', default: '' })
  meetingPoint: string;

  @Column({ type: 'text', name: 'what_to_bring', default: '' })
  whatToBring: string;

  /** Youngest age (in years on the day) that may sign up; 0 for none. */
  @Column({ type: 'integer', name: 'minimum_age', default: 0 })
  minimumAge: number;

  /** Total crew cap across roles. */
  @Column({ type: 'integer', default: 12 })
  capacity: number;

  /** iCalendar SEQUENCE: raised on every change a calendar should show. */
  @Column({ type: 'integer', default: 0 })
  sequence: number;

  @Column({ type: 'text', name: 'cancel_message', default: '' })
  cancelMessage: string;

  @Column({ type: 'timestamptz', name: 'published_at', nullable: true })
  publishedAt: Date | null;

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
