/** `npm start`: the local stack, a fresh client build when needed, and the app on one port. */
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { loadConfig } from '../config.js';
import { DEMO_PASSWORD, demoPeople } from '../db/seeds/demo-people.js';
import { runServer } from '../server.js';
import { clientBuildIsStale, markClientBuilt } from './client-build.js';
import { projectRoot, startLocalStack } from './stack.js';

const log = (s: string) => console.log(s);
const config = loadConfig();
const stack = await startLocalStack(config, log);

let stopping = false;
async function stopAll(server?: { close(): Promise<void> }): Promise<void> {
  if (stopping) return;
  stopping = true;
  log('Stopping Ebbroot…');
  await server?.close().catch((err: unknown) => log(`Closing the server failed: ${String(err)}`));
  await stack.stop();
  log('Stopped: server, fakes and PostgreSQL.');
  process.exit(0);
}
process.once('SIGINT', () => void stopAll());
process.once('SIGTERM', () => void stopAll());

try {
  if (clientBuildIsStale()) {
    log('Building the client…');
    const res = spawnSync(process.execPath, [join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js'), 'build', '--logLevel', 'warn'], { cwd: projectRoot, stdio: 'inherit' });
    if (res.status !== 0) throw new Error('Client build failed');
    markClientBuilt();
  }
  const server = await runServer({ config, clientDir: join(projectRoot, 'dist', 'client'), log: config.LOG_REQUESTS === 'true' ? log : () => undefined });
  process.removeAllListeners('SIGINT');
  process.removeAllListeners('SIGTERM');
  process.once('SIGINT', () => void stopAll(server));
  process.once('SIGTERM', () => void stopAll(server));
  const demo = demoPeople.slice(0, 3).map((p) => `  ${p.role.padEnd(12)} ${p.email}`).join('\n');
  log(`\nEbbroot is running at ${config.APP_URL}\n  mail inbox (fake): ${config.MAIL_INSPECT_URL}/\n\nDemo sign-ins (demo data only), password "${DEMO_PASSWORD}":\n${demo}\n\nPress Ctrl-C to stop.`);
} catch (err) {
  log(String(err instanceof Error ? err.stack : err));
  await stack.stop();
  process.exit(1);
}
