import type { DataSource } from 'typeorm';
import type { Mailer } from '../adapters/email.js';
import { OutboxMessage } from '../db/entities/outbox-message.entity.js';

/**
 * After this many failed attempts a row is given up on (status failed). With the queue's
 * retries and backoff, and the sweeper starting a fresh round when those run out, that is
 * more than a day of an unreachable mail server.
 */
export const MAX_SEND_ATTEMPTS = 120;

export type SendOutcome = 'sent' | 'skipped' | 'failed';

/** SMTP 5xx replies are permanent (RFC 5321 §4.2.1): retrying cannot help. */
function isPermanent(err: unknown): boolean {
  const code = (err as { responseCode?: unknown } | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

const describe = (err: unknown) => (err instanceof Error ? err.message : String(err)).slice(0, 2000);

/** Sends outbox rows through the Mailer, each at most once as far as the database can tell. */
export function createOutboxSender(deps: { db: DataSource; mailer: Mailer; clock: () => Date; log: (line: string) => void }) {
  return {
    /**
     * Claims the row (`FOR UPDATE SKIP LOCKED`, only while pending), sends it and marks it sent
     * in the same transaction, so two workers never send one row. A failure is recorded on the
     * row (attempts, last_error) and rethrown for the queue to retry; a permanent one, or one
     * past MAX_SEND_ATTEMPTS, marks the row failed instead. Only a crash between the SMTP
     * server's acceptance and the commit can send a row twice.
     */
    async send(id: string): Promise<SendOutcome> {
      let retry: { err: unknown } | undefined;
      const outcome = await deps.db.transaction(async (tx): Promise<SendOutcome> => {
        const row = await tx
          .getRepository(OutboxMessage)
          .createQueryBuilder('o')
          .setLock('pessimistic_write')
          .setOnLocked('skip_locked')
          .where('o.id = :id AND o.status = :status', { id, status: 'pending' })
          .getOne();
        if (!row) return 'skipped';
        try {
          await deps.mailer.send({
            to: row.toAddress,
            subject: row.subject,
            text: row.text,
            ...(row.html ? { html: row.html } : {}),
            attachments: row.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: Buffer.from(a.content, 'base64') })),
          });
        } catch (err) {
          const attempts = row.attempts + 1;
          const giveUp = isPermanent(err) || attempts >= MAX_SEND_ATTEMPTS;
          await tx.update(OutboxMessage, { id }, { attempts, lastError: describe(err), ...(giveUp ? { status: 'failed' as const } : {}) });
          deps.log(`[outbox] ${row.kind} ${id} to ${row.toAddress}: attempt ${attempts} failed: ${describe(err)}`);
          if (!giveUp) retry = { err };
          return 'failed';
        }
        await tx.update(OutboxMessage, { id }, { status: 'sent', sentAt: deps.clock(), attempts: row.attempts + 1, lastError: '' });
        return 'sent';
      });
      if (retry) throw retry.err;
      return outcome;
    },

    /** Ids of rows still waiting to go out, oldest first. */
    async pendingIds(limit = 500): Promise<string[]> {
      const rows = await deps.db.getRepository(OutboxMessage).find({ select: { id: true }, where: { status: 'pending' }, order: { createdAt: 'ASC' }, take: limit });
      return rows.map((r) => r.id);
    },
  };
}
export type OutboxSender = ReturnType<typeof createOutboxSender>;
