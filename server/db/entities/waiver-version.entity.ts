import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** A published waiver text; sign-ups record the version they accepted. Never edited, only superseded. */
@Entity({ name: 'waiver_version' })
export class WaiverVersion {
  @PrimaryColumn({ type: 'integer' })
  version: number;

  @Column({ type: 'text' })
  text: string;

  /** Text shown to a guardian signing for a minor. */
  @Column({ type: 'text', name: 'guardian_text', default: '' })
  guardianText: string;

  @Column({ type: 'uuid', name: 'created_by_id', nullable: true })
  createdById: string | null;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;
}
