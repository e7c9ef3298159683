/** Writing crew e-mails into the outbox: what the notifier and the reminder job share. */
import type { EntityManager } from 'typeorm';
import { Organisation } from '../db/entities/organisation.entity.js';
import { OutboxMessage } from '../db/entities/outbox-message.entity.js';
import type { User } from '../db/entities/user.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import type { CrewMailContext, MailContent } from '../domain/crew-mails.js';
import { reminderOptOutUrl } from './reminder-opt-out.service.js';

export interface CrewMailSettings {
  appUrl: string;
  /** Signs the unsubscribe-from-reminders links. */
  secret: string;
}

export interface QueuedMail {
  kind: string;
  to: string;
  content: MailContent;
  attachments?: { filename: string; content: string; contentType: string }[];
  /** A second message with the same key is dropped (ON CONFLICT DO NOTHING). */
  dedupeKey: string;
}

/** Inserts outbox rows; a repeated dedupe key is skipped without aborting the caller's transaction. */
export async function queueMails(tx: EntityManager, mails: QueuedMail[]): Promise<number> {
  if (mails.length === 0) return 0;
  const values = mails.map((m) => ({
    kind: m.kind,
    toAddress: m.to,
    subject: m.content.subject,
    text: m.content.text,
    html: m.content.html,
    attachments: (m.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.content, 'utf8').toString('base64') })),
    dedupeKey: m.dedupeKey,
  }));
  const result = await tx.createQueryBuilder().insert().into(OutboxMessage).values(values).orIgnore().execute();
  // RETURNING gives back only the rows actually inserted.
  return Array.isArray(result.raw) ? result.raw.length : 0;
}

export async function loadWorkday(tx: EntityManager, workdayId: string): Promise<Workday> {
  const w = await tx.getRepository(Workday).findOne({ where: { id: workdayId }, relations: { site: true } });
  if (!w) throw new Error(`Workday ${workdayId} not found`);
  return w;
}

export async function organisationName(tx: EntityManager): Promise<string> {
  return (await tx.getRepository(Organisation).findOneBy({ id: 1 }))?.name ?? 'Ebbroot';
}

export function mailContext(settings: CrewMailSettings, orgName: string, user: Pick<User, 'id' | 'name'>): CrewMailContext {
  return {
    appUrl: settings.appUrl,
    recipientName: user.name,
    organisationName: orgName,
    unsubscribeUrl: reminderOptOutUrl(settings.appUrl, settings.secret, user.id),
  };
}
