import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import pg from 'pg';
import type { Config } from '../config.js';
import { SESSION_COOKIE } from './csrf.js';

/**
 * Sessions in PostgreSQL, so any instance behind a proxy can serve any request. The cookie is
 * httpOnly, SameSite=Lax, and Secure whenever the app is served over https.
 */
export function pgSession(config: Config) {
  const pool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 5 });
  const PgStore = connectPgSimple(session);
  const handler = session({
    name: SESSION_COOKIE,
    secret: config.SESSION_SECRET,
    store: new PgStore({ pool, tableName: 'session', createTableIfMissing: false }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.APP_URL.startsWith('https://'), maxAge: 30 * 24 * 3600_000 },
  });
  return { handler, close: () => pool.end() };
}
