import type { Server } from 'node:http';
import type { Config } from './config.js';
import { createSmtpMailer } from './adapters/email.js';
import { createApp } from './app.js';
import { startBackground } from './background.js';
import { createDataSource } from './db/data-source.js';

export interface RunningServer {
  url: string;
  close(): Promise<void>;
}

/** Connects, migrates and listens: what `npm start` and the compiled server both run. */
export async function runServer(opts: { config: Config; clientDir?: string; log?: (line: string) => void }): Promise<RunningServer> {
  const { config } = opts;
  const log = opts.log ?? ((line: string) => console.log(line));
  const db = await createDataSource(config.DATABASE_URL).initialize();
  await db.runMigrations({ transaction: 'each' });
  const mailer = createSmtpMailer({ host: config.SMTP_HOST, port: config.SMTP_PORT, from: config.MAIL_FROM });
  const background = await startBackground({ config, db, mailer, log });
  const built = createApp({ config, db, mailer, log, clientDir: opts.clientDir, notifier: background.notifier });
  const server: Server = await new Promise((resolve, reject) => {
    const s = built.app.listen(config.PORT, config.HOST, () => resolve(s));
    s.once('error', reject);
  });
  return {
    url: `http://${config.HOST}:${config.PORT}`,
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await built.close();
      await background.stop();
      mailer.close();
      await db.destroy();
    },
  };
}
