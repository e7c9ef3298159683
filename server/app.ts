import { existsSync } from 'node:fs';
import { join } from 'node:path';
import connectPgSimple from 'connect-pg-simple';
import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import type { Config } from './config.js';
import { createPassport, useGoogleStrategy } from './adapters/google-auth.js';
import { createTideStationDirectory, type TideStationDirectory } from './adapters/tide-stations.js';
import type { Mailer } from './adapters/email.js';
import { csrfProtection, SESSION_COOKIE } from './middleware/csrf.js';
import { apiNotFound, errorHandler } from './middleware/error-handler.js';
import { requestLog } from './middleware/request-log.js';
import { authRouter } from './routes/auth.router.js';
import { healthRouter } from './routes/health.router.js';
import { organisationRouter } from './routes/organisation.router.js';
import { siteRouter } from './routes/site.router.js';
import { tideRouter } from './routes/tide.router.js';
import { workdayRouter } from './routes/workday.router.js';
import { calendarRouter } from './routes/calendar.router.js';
import { crewRouter } from './routes/crew.router.js';
import { meRouter } from './routes/me.router.js';
import { waiverRouter } from './routes/waiver.router.js';
import { userRouter, volunteerRouter } from './routes/user.router.js';
import { createAuthTokenService } from './services/auth-token.service.js';
import { createAuthService } from './services/auth.service.js';
import { createOrganisationService } from './services/organisation.service.js';
import { createSiteTideService } from './services/site-tide.service.js';
import { createSiteService } from './services/site.service.js';
import { createStationService } from './services/station.service.js';
import { createWorkdayService } from './services/workday.service.js';
import type { CrewNotifier } from './services/crew-notifier.js';
import { createAttendanceService } from './services/attendance.service.js';
import { createCalendarService } from './services/calendar.service.js';
import { createReminderOptOutService } from './services/reminder-opt-out.service.js';
import { createMeService } from './services/me.service.js';
import { createRosterService } from './services/roster.service.js';
import { createSignupService } from './services/signup.service.js';
import { createWaiverService } from './services/waiver.service.js';
import { createPasswordHasher } from './services/password-hasher.js';
import { createUserService } from './services/user.service.js';

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
  const secureCookies = config.APP_URL.startsWith('https://');

  const users = createUserService({ db });
  const organisation = createOrganisationService({ db });
  const stations = createStationService({ stations: deps.tideStations ?? createTideStationDirectory() });
  const sites = createSiteService({ db, stations });
  const siteTide = createSiteTideService({ sites, stations, organisation });
  const { notifier } = deps;
  const workdays = createWorkdayService({ db, sites, notifier });
  const waivers = createWaiverService({ db });
  const signups = createSignupService({ db, sites, waivers, notifier, clock });
  const roster = createRosterService({ db });
  const attendance = createAttendanceService({ db, clock });
  const me = createMeService({ db });
  const calendar = createCalendarService({ db, appUrl: config.APP_URL, clock });
  const optOut = createReminderOptOutService({ db, secret: config.SESSION_SECRET });
  const tokens = createAuthTokenService({ db, clock });
  const hasher = createPasswordHasher(config.PASSWORD_SCRYPT_LOG_N);
  const auth = createAuthService({ db, hasher, tokens, mailer: deps.mailer, appUrl: config.APP_URL, clock, log });

  const passport = createPassport();
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    users.findById(id).then((u) => done(null, u ?? false), done);
  });
  useGoogleStrategy(passport, {
    clientId: config.GOOGLE_CLIENT_ID,
    clientSecret: config.GOOGLE_CLIENT_SECRET,
    callbackUrl: `${config.APP_URL}/api/auth/google/callback`,
    authorizationUrl: config.GOOGLE_AUTH_URL,
    tokenUrl: config.GOOGLE_TOKEN_URL,
    userInfoUrl: config.GOOGLE_USERINFO_URL,
  }, (identity) => auth.signInWithGoogle(identity));

  const sessionPool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 5 });
  const PgStore = connectPgSimple(session);

  const app = express();
  app.disable('x-powered-by');
  app.use(requestLog({ enabled: config.LOG_REQUESTS === 'true', log }));
  app.use(helmet({ contentSecurityPolicy: { directives: { 'img-src': ["'self'", 'data:', 'blob:'] } } }));
  app.use(express.json({ limit: '200kb' }));
  app.use(
    session({
      name: SESSION_COOKIE,
      secret: config.SESSION_SECRET,
      store: new PgStore({ pool: sessionPool, tableName: 'session', createTableIfMissing: false }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: secureCookies, maxAge: 30 * 24 * 3600_000 },
    }),
  );
  app.use(passport.initialize());
  app.use(passport.session());
  app.use(csrfProtection);

  app.use('/api/health', healthRouter({ db }));
  app.use('/api/auth', authRouter({ auth, passport }));
  app.use('/api/organisation', organisationRouter({ organisation }));
  app.use('/api', tideRouter({ stations, siteTide, organisation }));
  app.use('/api/sites', siteRouter({ sites }));
  // Before the workday router, whose '/:id' would otherwise catch '<id>.ics'.
  app.use('/api', calendarRouter({ calendar, optOut, appUrl: config.APP_URL }));
  app.use('/api', crewRouter({ signups, roster, attendance, workdays }));
  app.use('/api/workdays', workdayRouter({ workdays }));
  app.use('/api/waiver', waiverRouter({ waivers }));
  app.use('/api/me', meRouter({ me }));
  app.use('/api/users', userRouter({ users }));
  app.use('/api/volunteers', volunteerRouter({ users }));
  app.use('/api', apiNotFound);

  const clientDir = deps.clientDir;
  if (clientDir && existsSync(join(clientDir, 'index.html'))) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // '{*splat}' also matches '/' itself, which '/*splat' does not in Express 5.
    app.get('/{*splat}', (_req, res) => res.sendFile(join(clientDir, 'index.html')));
  }
  app.use(errorHandler({ exposeStack: config.NODE_ENV === 'development', log }));

  return { app, close: () => sessionPool.end() };
}
