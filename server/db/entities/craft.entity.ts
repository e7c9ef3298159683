import { Check, Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export type CraftKind = 'sit-on-top-kayak' | 'tandem-kayak' | 'canoe' | 'skiff' | 'other';

/** A boat, canoe or kayak of the organisation's fleet (volunteers' own kayaks come from sign-ups). */
@Entity({ name: 'craft' })
@Check('CHK_craft_kind', `"kind" IN ('sit-on-top-kayak', 'tandem-kayak', 'canoe', 'skiff', 'other')`)
@Check('CHK_craft_limits', `"seats" >= 1 AND "max_load_kg" > 0 AND "pot_slots" >= 0 AND "speed_kmh" > 0`)
export class Craft {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'varchar', length: 80, unique: true })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  kind: CraftKind;

  @Column({ type: 'integer' })
  seats: number;

  /** Maker's rating or capacity plate, kg. */
  @Column({ type: 'double precision', name: 'max_load_kg' })
  maxLoadKg: number;

  /** Whether the figure comes from a capacity plate (the plated margin applies). */
  @Column({ type: 'boolean', name: 'has_capacity_plate', default: false })
  hasCapacityPlate: boolean;

  @Column({ type: 'integer', name: 'pot_slots', default: 0 })
  potSlots: number;

  @Column({ type: 'double precision', name: 'draft_m', nullable: true })
  draftM: number | null;

  @Column({ type: 'double precision', name: 'speed_kmh' })
  speedKmh: number;

  @Column({ type: 'boolean', name: 'needs_operator', default: false })
  needsOperator: boolean;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @Column({ type: 'text', default: '' })
  notes: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
