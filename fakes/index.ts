import { createInspectApp } from './smtp/inspect-app.js';
import { createMailStore } from './smtp/mail-store.js';
import { startSmtpFake } from './smtp/smtp-fake.js';
import { createOAuthApp } from './oauth/oauth-app.js';
import { createStripeApp } from './stripe/stripe-app.js';
import { createWebhookSender, type WebhookEndpoint } from './stripe/webhook-sender.js';
import { listenHttp, type ListeningServer } from './support/http-server.js';
import type { LogLine } from './support/request-log.js';

export interface FakesOptions {
  /** Pass 0 for any free port; RunningFakes reports the port actually bound. */
  smtpPort: number;
  mailInspectPort: number;
  oauthPort: number;
  stripePort: number;
  /** Defaults to loopback so the fakes are never reachable from the network. */
  host?: string;
  log?: LogLine;
  /**
   * Where the payments fake sends signed events (the app's webhook route) and the signing
   * secret; without it events are only recorded until `POST /__fake/webhook-endpoint` sets one.
   */
  stripeWebhook?: WebhookEndpoint;
}

export interface RunningFakes {
  smtpPort: number;
  mailInspectPort: number;
  oauthPort: number;
  stripePort: number;
  close(): Promise<void>;
}

/** Closes every server even when one fails, then reports the first failure. */
async function closeAll(servers: Array<Pick<ListeningServer, 'close'>>): Promise<void> {
  const results = await Promise.allSettled(servers.map((server) => server.close()));
  const failure = results.find((result) => result.status === 'rejected');
  if (failure) throw failure.reason;
}

/**
 * Starts the SMTP server, its inbox, the OAuth2 provider and the payments API on
 * loopback; the payments API sends signed events to `stripeWebhook` when given. If any
 * port cannot be bound, the ones already started are closed again.
 *
 * @example
 * const fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
 * // new Stripe(key, { host: '127.0.0.1', port: fakes.stripePort, protocol: 'http' })
 * await fakes.close();
 */
export async function startFakes(opts: FakesOptions): Promise<RunningFakes> {
  const host = opts.host ?? '127.0.0.1';
  const log = opts.log ?? (() => undefined);
  const started: Array<Pick<ListeningServer, 'close'>> = [];
  const start = async (listening: Promise<ListeningServer>): Promise<number> => {
    const server = await listening;
    started.push(server);
    return server.port;
  };
  try {
    const store = createMailStore();
    const smtpPort = await start(startSmtpFake({ port: opts.smtpPort, host, store, log }));
    const mailInspectPort = await start(listenHttp(createInspectApp(store, log), opts.mailInspectPort, host));
    const oauthPort = await start(listenHttp(createOAuthApp(log), opts.oauthPort, host));
    let stripeUrl = '';
    const webhooks = createWebhookSender({ endpoint: opts.stripeWebhook, log });
    // Closing also ends waiting retries, so no timer outlives the fakes.
    started.push({ close: async () => webhooks.stop() });
    const stripeApp = createStripeApp({ log, baseUrl: () => stripeUrl, webhooks });
    const stripePort = await start(listenHttp(stripeApp, opts.stripePort, host));
    stripeUrl = `http://${host.includes(':') ? `[${host}]` : host}:${stripePort}`;
    return { smtpPort, mailInspectPort, oauthPort, stripePort, close: () => closeAll(started) };
  } catch (error) {
    await closeAll(started).catch(() => undefined);
    throw error;
  }
}
