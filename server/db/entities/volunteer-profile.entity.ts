import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { EmergencyContact, Skill } from '../../../shared/schemas/crew.schema.js';
import { User } from './user.entity.js';

/** A person's volunteering details, kept between sign-ups. */
@Entity({ name: 'volunteer_profile' })
export class VolunteerProfile {
  @PrimaryColumn({ type: 'uuid', name: 'user_id' })
  userId: string;

  @OneToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Column({ type: 'date', name: 'date_of_birth', nullable: true })
  dateOfBirth: string | null;

  @Column({ type: 'varchar', length: 40, nullable: true })
  phone: string | null;

  @Column({ type: 'jsonb', name: 'emergency_contact', nullable: true })
  emergencyContact: EmergencyContact | null;

  @Column({ type: 'jsonb', default: () => `'[]'` })
  skills: Skill[];

  /** Private: coordinators use it for boat loads only when the person chose to give it. */
  @Column({ type: 'double precision', name: 'weight_kg', nullable: true })
  weightKg: number | null;

  @Column({ type: 'boolean', name: 'reminders_opt_out', default: false })
  remindersOptOut: boolean;

  /** Secret of the personal calendar feed URL; replaced to revoke the old URL. */
  @Column({ type: 'varchar', length: 64, name: 'calendar_token', nullable: true, unique: true })
  calendarToken: string | null;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
