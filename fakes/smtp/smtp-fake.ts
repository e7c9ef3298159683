import { simpleParser } from 'mailparser';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { bind, type ListeningServer } from '../support/http-server.js';
import type { LogLine } from '../support/request-log.js';
import type { MailStore } from './mail-store.js';

export interface SmtpFakeOptions {
  port: number;
  host: string;
  store: MailStore;
  log: LogLine;
}

const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

/**
 * Accepts any mail over plain SMTP on loopback and keeps it in the store. The SMTP
 * reply is sent only after the message is stored, so once the sender's sendMail()
 * resolves the message is already visible through the inspection API.
 */
export async function startSmtpFake(options: SmtpFakeOptions): Promise<ListeningServer> {
  const { store, log } = options;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    // close() would otherwise wait up to 30 s for pooled client connections.
    closeTimeout: 100,
    onData(stream, session, callback) {
      receive(stream, session, store)
        .then((line) => {
          log(line);
          callback();
        })
        .catch((error: unknown) => {
          log(`[smtp] rejected a message: ${String(error)}`);
          callback(error instanceof Error ? error : new Error(String(error)));
        });
    },
  });
  // Without a listener, a socket error on the server would be thrown as uncaught.
  server.on('error', (error) => log(`[smtp] ${error.message}`));
  const port = await bind(server.server, options.port, options.host);
  return {
    port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

async function receive(stream: SMTPServerDataStream, session: SMTPServerSession, store: MailStore): Promise<string> {
  const parsed = await simpleParser(stream);
  if (stream.sizeExceeded) throw new Error('Message exceeds the fixed maximum message size');
  const recipients = session.envelope.rcptTo.map((rcpt) => rcpt.address);
  const message = store.add(parsed, recipients, new Date());
  return `[smtp] stored message ${message.id} to ${recipients.join(', ')}: ${message.subject}`;
}
