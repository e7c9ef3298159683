import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Workday } from './workday.entity.js';

/** A workday's trip plan: the solver's instance and result (or the coordinator's edited runs). */
@Entity({ name: 'trip_plan' })
export class TripPlan {
  @PrimaryColumn({ type: 'uuid', name: 'workday_id' })
  workdayId: string;

  @OneToOne(() => Workday, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workday_id' })
  workday: Relation<Workday>;

  /** The self-contained instance (ISO times), as sent to the solver. */
  @Column({ type: 'jsonb' })
  instance: Record<string, unknown>;

  /** The plan (ISO times): runs, unplaced, status. */
  @Column({ type: 'jsonb' })
  plan: Record<string, unknown>;

  /** 'solver' or 'edited' (changed by hand and validated). */
  @Column({ type: 'varchar', length: 10, default: 'solver' })
  source: string;

  @Column({ type: 'uuid', name: 'updated_by_id', nullable: true })
  updatedById: string | null;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
