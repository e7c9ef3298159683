import type { ParsedMail } from 'mailparser';

export interface StoredAttachment {
  filename: string;
  contentType: string;
  content: Buffer;
}

export interface StoredMessage {
  id: string;
  /** Envelope recipients (RCPT TO), so Cc and Bcc receivers are findable too. */
  to: string[];
  from: string;
  subject: string;
  text: string;
  html: string;
  attachments: StoredAttachment[];
  /** When the fake accepted the message, not the sender's Date header. */
  date: string;
}

/** The JSON shape the inspection API returns. */
export interface MessageView extends Omit<StoredMessage, 'attachments'> {
  attachments: string[];
}

export interface MailStore {
  add(parsed: ParsedMail, envelopeTo: string[], receivedAt: Date): StoredMessage;
  /** Newest first; `to` matches any envelope recipient, ignoring case. */
  list(to?: string): StoredMessage[];
  get(id: string): StoredMessage | undefined;
  clear(): void;
}

export function toMessageView(message: StoredMessage): MessageView {
  return { ...message, attachments: message.attachments.map((a) => a.filename) };
}

/** In-memory inbox; the cap keeps a long dev session from growing without bound. */
export function createMailStore(cap = 500): MailStore {
  const messages: StoredMessage[] = [];
  let sequence = 0;
  return {
    add(parsed, envelopeTo, receivedAt) {
      sequence += 1;
      const message: StoredMessage = {
        id: String(sequence),
        to: envelopeTo,
        from: parsed.from?.text ?? '',
        subject: parsed.subject ?? '',
        text: parsed.text ?? '',
        html: typeof parsed.html === 'string' ? parsed.html : '',
        attachments: parsed.attachments.map((attachment, index) => ({
          filename: attachment.filename ?? `attachment-${index + 1}`,
          contentType: attachment.contentType,
          content: attachment.content,
        })),
        date: receivedAt.toISOString(),
      };
      messages.unshift(message);
      if (messages.length > cap) messages.length = cap;
      return message;
    },
    list(to) {
      if (to === undefined || to === '') return [...messages];
      const wanted = to.trim().toLowerCase();
      return messages.filter((m) => m.to.some((address) => address.toLowerCase() === wanted));
    },
    get(id) {
      return messages.find((m) => m.id === id);
    },
    clear() {
      messages.length = 0;
    },
  };
}
