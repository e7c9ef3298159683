import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, type Relation } from 'typeorm';
import type { SalinityMethod } from '../../../shared/schemas/nursery.schema.js';
import { Tank } from './tank.entity.js';

/** A tank's salinity, as read (refractometer ppt, or hydrometer SG t/t with temperature) and as ppt. */
@Entity({ name: 'salinity_reading' })
@Index('IDX_salinity_reading_tank_time', ['tankId', 'takenAt'])
export class SalinityReading {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'tank_id' })
  tankId: string;

  @ManyToOne(() => Tank, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tank_id' })
  tank: Relation<Tank>;

  @Column({ type: 'timestamptz', name: 'taken_at' })
  takenAt: Date;

  @Column({ type: 'varchar', length: 20 })
  method: SalinityMethod;

  @Column({ type: 'double precision', name: 'salinity_ppt' })
  salinityPpt: number;

  @Column({ type: 'double precision', name: 'specific_gravity', nullable: true })
  specificGravity: number | null;

  @Column({ type: 'double precision', name: 'temperature_c', nullable: true })
  temperatureC: number | null;

  @Column({ type: 'uuid', name: 'taken_by_id', nullable: true })
  takenById: string | null;

  @Column({ type: 'varchar', length: 300, default: '' })
  note: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
