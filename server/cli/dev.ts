/** `npm run dev`: the local stack and the API (restarted by tsx on change), plus Vite with hot reload. */
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { loadConfig } from '../config.js';
import { projectRoot, startLocalStack } from './stack.js';

const config = loadConfig();
const stack = await startLocalStack(config, (s) => console.log(s));
const children = [
  spawn(process.execPath, [join(projectRoot, 'node_modules', 'tsx', 'dist', 'cli.mjs'), 'watch', '--clear-screen=false', join(projectRoot, 'server', 'main.ts')], { cwd: projectRoot, stdio: 'inherit' }),
  spawn(process.execPath, [join(projectRoot, 'node_modules', 'vite', 'bin', 'vite.js')], { cwd: projectRoot, stdio: 'inherit' }),
];
console.log(`\nVite with hot reload: http://127.0.0.1:5179 (API on ${config.APP_URL}); Ctrl-C stops everything.`);

let stopping = false;
async function stop() {
  if (stopping) return;
  stopping = true;
  for (const c of children) c.kill('SIGTERM');
  await stack.stop();
  process.exit(0);
}
process.once('SIGINT', () => void stop());
process.once('SIGTERM', () => void stop());
