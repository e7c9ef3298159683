import { existsSync } from 'node:fs';
import { join } from 'node:path';
import express, { type Express } from 'express';
import helmet from 'helmet';
import type { DataSource } from 'typeorm';
import type { Config } from './config.js';
import type { Mailer } from './adapters/email.js';
import { createPassport, useGoogleStrategy } from './adapters/google-auth.js';
import type { TideStationDirectory } from './adapters/tide-stations.js';
import { csrfProtection } from './middleware/csrf.js';
import { errorHandler } from './middleware/error-handler.js';
import { requestLog } from './middleware/request-log.js';
import { pgSession } from './middleware/session.js';
import { mountApi } from './routes/index.js';
import { stripeWebhookRouter } from './routes/webhook.router.js';
import type { CrewNotifier } from './services/crew-notifier.js';
import { createServices } from './services/index.js';

export interface AppDeps {
  config: Config;
  db: DataSource;
  mailer: Mailer;
  clock?: () => Date;
  log?: (line: string) => void;
  /** Folder of the built client; served with an index.html fallback when present. */
  clientDir?: string;
  /** Tells crews about their places and changes (writes the mail outbox). */
  notifier: CrewNotifier;
  /** Tide stations; the open dataset by default. */
  tideStations?: TideStationDirectory;
}

export interface App {
  app: Express;
  /** Closes what createApp opened (the session pool). */
  close(): Promise<void>;
}

/** Builds the Express app from its dependencies; never listens. */
export function createApp(deps: AppDeps): App {
  const { config, db } = deps;
  const log = deps.log ?? ((line: string) => console.log(line));
  const clock = deps.clock ?? (() => new Date());
  const services = createServices({ ...deps, clock, log });

  const passport = createPassport();
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    services.users.findById(id).then((u) => done(null, u ?? false), done);
  });
  useGoogleStrategy(passport, {
    clientId: config.GOOGLE_CLIENT_ID,
    clientSecret: config.GOOGLE_CLIENT_SECRET,
    callbackUrl: `${config.APP_URL}/api/auth/google/callback`,
    authorizationUrl: config.GOOGLE_AUTH_URL,
    tokenUrl: config.GOOGLE_TOKEN_URL,
    userInfoUrl: config.GOOGLE_USERINFO_URL,
  }, (identity) => services.auth.signInWithGoogle(identity));

  const sessions = pgSession(config);
  const app = express();
  app.disable('x-powered-by');
  app.use(requestLog({ enabled: config.LOG_REQUESTS === 'true', log }));
  app.use(helmet({ contentSecurityPolicy: { directives: { 'img-src': ["'self'", 'data:', 'blob:'] } } }));
  // Payment webhooks need the raw body for their signature and have no session: before the JSON parser and CSRF.
  app.use('/api/webhooks/stripe', stripeWebhookRouter({ webhooks: services.donationWebhooks }));
  app.use(express.json({ limit: '200kb' }));
  app.use(sessions.handler);
  app.use(passport.initialize());
  app.use(passport.session());
  app.use(csrfProtection);
  mountApi(app, services, { db, passport, config });

  const clientDir = deps.clientDir;
  if (clientDir && existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // '{*splat}' also matches '/' itself, which '/*splat' does not in Express 5.
    app.get('/{*splat}', (_req, res) => res.sendFile(join(clientDir, 'index.html')));
  }
  app.use(errorHandler({ exposeStack: config.NODE_ENV === 'development', log }));

  return { app, close: sessions.close };
}
