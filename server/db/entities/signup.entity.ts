import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import type { CrewRole, OwnCraft, SignupStatus } from '../../../shared/schemas/crew.schema.js';
import { User } from './user.entity.js';
import { Workday } from './workday.entity.js';

/** A person's place (or place in line) on a workday's crew, with their waiver and check-in. */
@Entity({ name: 'signup' })
// One live place per person per workday; the database enforces it, whatever the timing.
@Index('UQ_signup_live_person', ['workdayId', 'userId'], { unique: true, where: `"status" <> 'cancelled'` })
@Index('IDX_signup_workday_status', ['workdayId', 'status'])
export class Signup {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: 'uuid', name: 'workday_id' })
  workdayId: string;

  @ManyToOne(() => Workday, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'workday_id' })
  workday: Relation<Workday>;

  @Index()
  @Column({ type: 'uuid', name: 'user_id' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: Relation<User>;

  @Column({ type: 'varchar', length: 20 })
  role: CrewRole;

  @Column({ type: 'varchar', length: 20 })
  status: SignupStatus;

  /** Waitlist order: when the person joined the line (or signed up). */
  @Column({ type: 'timestamptz', name: 'queued_at' })
  queuedAt: Date;

  @Column({ type: 'integer', name: 'waiver_version' })
  waiverVersion: number;

  @Column({ type: 'varchar', length: 120, name: 'waiver_signed_name' })
  waiverSignedName: string;

  @Column({ type: 'timestamptz', name: 'waiver_signed_at' })
  waiverSignedAt: Date;

  /** Whether the person was under 18 on the workday's date when signing up. */
  @Column({ type: 'boolean', name: 'is_minor', default: false })
  isMinor: boolean;

  @Column({ type: 'uuid', name: 'guardian_user_id', nullable: true })
  guardianUserId: string | null;

  /** A guardian not on the crew: name, phone, e-mail, relationship, typed signature. */
  @Column({ type: 'jsonb', name: 'guardian', nullable: true })
  guardian: { name: string; phone: string; email?: string; relationship: string; signedName: string; signedAt: string } | null;

  @Column({ type: 'jsonb', name: 'own_craft', nullable: true })
  ownCraft: OwnCraft | null;

  @Column({ type: 'varchar', length: 300, name: 'operator_qualification', default: '' })
  operatorQualification: string;

  @Column({ type: 'varchar', length: 500, default: '' })
  note: string;

  @Column({ type: 'timestamptz', name: 'checked_in_at', nullable: true })
  checkedInAt: Date | null;

  @Column({ type: 'timestamptz', name: 'checked_out_at', nullable: true })
  checkedOutAt: Date | null;

  @Column({ type: 'boolean', name: 'no_show', default: false })
  noShow: boolean;

  /** Minutes credited when a coordinator corrects the check-in/out span (reason in the audit log). */
  @Column({ type: 'integer', name: 'minutes_override', nullable: true })
  minutesOverride: number | null;

  @Column({ type: 'timestamptz', name: 'cancelled_at', nullable: true })
  cancelledAt: Date | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' })
  updatedAt: Date;
}
