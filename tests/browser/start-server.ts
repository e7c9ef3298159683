/** Runs what `npm start` runs (server/cli/start.ts) against the test database, on the browser-test ports. */
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { projectRoot } from '../../server/cli/stack.js';
import { BROWSER_APP_PORT, BROWSER_FAKE_PORTS as P } from '../setup/test-env.js';

export interface StartedApp {
  url: string;
  mailUrl: string;
  output: () => string;
  /** Sends SIGINT like Ctrl-C and resolves with the exit code. */
  stop(): Promise<number | null>;
}

export async function startLikeNpmStart(): Promise<StartedApp> {
  const url = `http://127.0.0.1:${BROWSER_APP_PORT}`;
  const oauth = `http://127.0.0.1:${P.oauth}`;
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    PORT: String(BROWSER_APP_PORT),
    APP_URL: url,
    SMTP_PORT: String(P.smtp),
    MAIL_INSPECT_URL: `http://127.0.0.1:${P.mailInspect}`,
    GOOGLE_AUTH_URL: `${oauth}/o/oauth2/v2/auth`,
    GOOGLE_TOKEN_URL: `${oauth}/token`,
    GOOGLE_USERINFO_URL: `${oauth}/userinfo`,
    STRIPE_API_URL: `http://127.0.0.1:${P.stripe}`,
    LOG_REQUESTS: 'false',
  };
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', join(projectRoot, 'server', 'cli', 'start.ts')], { cwd: projectRoot, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`start did not come up:\n${output}`)), 240_000);
    const onData = (d: Buffer) => {
      output += d.toString();
      if (output.includes('Press Ctrl-C to stop')) {
        clearTimeout(timer);
        resolve();
      }
    };
    child.stdout?.on('data', onData);
    child.stderr?.on('data', onData);
    child.once('exit', (code) => reject(new Error(`start exited with ${code}:\n${output}`)));
  });
  return {
    url,
    mailUrl: env.MAIL_INSPECT_URL,
    output: () => output,
    stop: () =>
      new Promise((resolve) => {
        child.once('exit', (code) => resolve(code));
        child.kill('SIGINT');
      }),
  };
}
