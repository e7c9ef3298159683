import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import { Site } from './site.entity.js';
import { Workday } from './workday.entity.js';

/** A survival check at a site, on a monitoring workday or ad hoc; its per-tree results are tree_check rows. */
@Entity({ name: 'monitoring_visit' })
export class MonitoringVisit {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index()
  @Column({ type: 'uuid', name: 'site_id' })
  siteId: string;

  @ManyToOne(() => Site, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'site_id' })
  site: Relation<Site>;

  @Index()
  @Column({ type: 'uuid', name: 'workday_id', nullable: true })
  workdayId: string | null;

  @ManyToOne(() => Workday, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'workday_id' })
  workday: Relation<Workday> | null;

  @Column({ type: 'date', name: 'visited_on' })
  visitedOn: string;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'uuid', name: 'created_by_id', nullable: true })
  createdById: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
