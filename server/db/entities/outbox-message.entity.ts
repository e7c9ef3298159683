import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type OutboxStatus = 'pending' | 'sent' | 'failed';

/**
 * An e-mail waiting to go out. Written in the same transaction as the change it reports, then
 * sent by a job queue worker; nothing is lost while the SMTP server is down.
 */
@Entity({ name: 'outbox_message' })
export class OutboxMessage {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** e.g. signup-confirmed, waitlisted, promoted, reminder, workday-changed, workday-cancelled. */
  @Column({ type: 'varchar', length: 40 })
  kind: string;

  @Column({ type: 'varchar', length: 254, name: 'to_address' })
  toAddress: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text', default: '' })
  html: string;

  @Column({ type: 'jsonb', default: () => `'[]'` })
  attachments: { filename: string; content: string; contentType: string }[];

  /** Makes repeated sends idempotent, e.g. `reminder:<workday>:<user>`. */
  @Column({ type: 'varchar', length: 200, name: 'dedupe_key', nullable: true, unique: true })
  dedupeKey: string | null;

  @Index()
  @Column({ type: 'varchar', length: 10, default: 'pending' })
  status: OutboxStatus;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @Column({ type: 'text', name: 'last_error', default: '' })
  lastError: string;

  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' })
  createdAt: Date;

  @Column({ type: 'timestamptz', name: 'sent_at', nullable: true })
  sentAt: Date | null;
}
