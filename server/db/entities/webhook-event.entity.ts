import { Column, Entity, PrimaryColumn } from 'typeorm';

/** Payment webhook events already handled, by the provider's event id, so a replay changes nothing. */
@Entity({ name: 'webhook_event' })
export class WebhookEvent {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  id: string;

  @Column({ type: 'varchar', length: 80 })
  type: string;

  @Column({ type: 'timestamptz', name: 'received_at' })
  receivedAt: Date;
}
