/**
 * `npm test`: Debian's Chromium for the browser tests (installed when missing), the test
 * PostgreSQL cluster on loopback, then every Vitest project. Ends with "N passed, N failed".
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { startLocalPostgres } from './postgres.js';
import { projectRoot } from './stack.js';
import { TEST_PG_PORT } from '../../tests/setup/test-env.js';

const log = (s: string) => console.log(s);

function ensureChromium(): void {
  if (existsSync('/usr/bin/chromium')) return;
  if (process.getuid?.() !== 0) {
    throw new Error('Browser tests need Debian chromium. Run as root: apt-get update && apt-get install -y chromium');
  }
  log('Installing Debian chromium for the browser tests…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit', env });
}

ensureChromium();
const postgres = await startLocalPostgres({ projectRoot, name: 'pg-test', port: TEST_PG_PORT, fast: true, log });
log(`Test PostgreSQL on 127.0.0.1:${TEST_PG_PORT} (data in ${postgres.dataDir})`);

/** Runs a checker over the whole tree; each counts as one check in the closing line. */
function check(name: string, script: string, args: string[]): boolean {
  log(`${name}…`);
  const res = spawnSync(process.execPath, [join(projectRoot, 'node_modules', ...script.split('/')), ...args], { cwd: projectRoot, stdio: 'inherit' });
  log(res.status === 0 ? `${name}: clean` : `${name}: problems found (see above)`);
  return res.status === 0;
}
const checks = [
  check('eslint', 'eslint/bin/eslint.js', ['.']),
  check('type check (vue-tsc)', 'vue-tsc/bin/vue-tsc.js', ['--noEmit', '-p', 'tsconfig.json']),
];
const checksFailed = checks.filter((ok) => !ok).length;

const reportDir = join(projectRoot, '.data', 'test-report');
mkdirSync(reportDir, { recursive: true });
const reportFile = join(reportDir, 'vitest.json');
const vitest = join(projectRoot, 'node_modules', 'vitest', 'vitest.mjs');
const res = spawnSync(
  process.execPath,
  [vitest, 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${reportFile}`, ...process.argv.slice(2)],
  { cwd: projectRoot, stdio: 'inherit', env: { ...process.env, NODE_ENV: 'test' } },
);
postgres.stop();

let summary = 'no test report was written';
if (existsSync(reportFile)) {
  const report = JSON.parse(readFileSync(reportFile, 'utf8')) as { numPassedTests: number; numFailedTests: number; numPendingTests: number; numTodoTests: number };
  const passed = report.numPassedTests + checks.length - checksFailed;
  const failed = report.numFailedTests + checksFailed;
  summary = `${passed} passed, ${failed} failed`;
  const skipped = report.numPendingTests + report.numTodoTests;
  if (skipped > 0) summary += `, ${skipped} skipped`;
}
console.log(`\n${summary}`);
process.exit(checksFailed > 0 ? 1 : (res.status ?? 1));
