import { existsSync } from 'node:fs';
import { z } from 'zod';

const Config = z.object({
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  HOST: z.string().default('127.0.0.1'),
  PORT: z.coerce.number().int().positive().default(5180),
  APP_URL: z.url(),
  DATABASE_URL: z.url(),
  SESSION_SECRET: z.string().min(16),
  SMTP_HOST: z.string(),
  SMTP_PORT: z.coerce.number().int().positive(),
  MAIL_FROM: z.string(),
  MAIL_INSPECT_URL: z.url(),
  GOOGLE_CLIENT_ID: z.string().min(1),
  GOOGLE_CLIENT_SECRET: z.string().min(1),
  GOOGLE_AUTH_URL: z.url(),
  GOOGLE_TOKEN_URL: z.url(),
  GOOGLE_USERINFO_URL: z.url().refine((u) => u.endsWith('/userinfo'), 'must end in /userinfo'),
  STRIPE_SECRET_KEY: z.string().min(1),
  STRIPE_WEBHOOK_SECRET: z.string().min(1),
  STRIPE_API_URL: z.url(),
  /** scrypt cost as log2(N); 17 is OWASP's recommendation, tests lower it for speed. */
  PASSWORD_SCRYPT_LOG_N: z.coerce.number().int().min(10).max(20).default(17),
  LOG_REQUESTS: z.enum(['true', 'false']).default('true'),
  /** Uploaded photos; outside the web root (relative paths are from the working directory). */
  UPLOADS_DIR: z.string().min(1).default('.data/uploads'),
});
export type Config = z.infer<typeof Config>;

/**
 * Reads `.env` when present, else the documented development values in `.env.example`;
 * variables already in the environment win. Fails fast on anything missing or malformed.
 */
export function loadConfig(env: NodeJS.ProcessEnv = process.env, root = process.cwd()): Config {
  const file = existsSync(`${root}/.env`) ? `${root}/.env` : `${root}/.env.example`;
  if (env === process.env && existsSync(file)) process.loadEnvFile(file);
  const parsed = Config.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Configuration is invalid:\n${lines.join('\n')}`);
  }
  return parsed.data;
}
