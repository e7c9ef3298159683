import { Check, Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';
import type { CrewRole } from '../../../shared/schemas/crew.schema.js';
import { Workday } from './workday.entity.js';

/** A per-role cap on a workday; a workday without rows lets any role sign up within its total cap. */
@Entity({ name: 'workday_role' })
@Check('CHK_workday_role_capacity', `"capacity" >= 0`)
export class WorkdayRole {
  @PrimaryColumn({ type: 'uuid', name: 'workday_id' })
  workdayId: string;

  @PrimaryColumn({ type: 'varchar', length: 20 })
  role: CrewRole;

  @Column({ type: 'integer' })
  capacity: number;

  @ManyToOne(() => Workday, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workday_id' })
  workday: Relation<Workday>;
}
