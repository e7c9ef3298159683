#!/usr/bin/env node
// Entry of `npm start`, `npm test`, `npm run dev` and `npm run bench`. Plain JavaScript on
// purpose: it must run before any dependency is installed. It installs npm dependencies
// when node_modules is missing or older than package-lock.json, then hands over to the
// TypeScript command in this folder (run through tsx).
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const command = process.argv[2];
const commands = { start: 'start.ts', test: 'test.ts', dev: 'dev.ts', bench: 'bench.ts' };
if (!commands[command]) {
  console.error(`usage: bootstrap.mjs ${Object.keys(commands).join('|')}`);
  process.exit(2);
}

const [major, minor] = process.versions.node.split('.').map(Number);
if (major < 20 || (major === 20 && minor < 19)) {
  console.error(`Ebbroot needs Node.js 20.19 or newer (this is ${process.versions.node}).`);
  process.exit(1);
}

function lockHash() {
  const lock = join(root, 'package-lock.json');
  const pkg = join(root, 'package.json');
  const h = createHash('sha256');
  for (const f of [pkg, lock]) if (existsSync(f)) h.update(readFileSync(f));
  return h.digest('hex');
}

const stamp = join(root, 'node_modules', '.ebbroot-install-stamp');
const wanted = lockHash();
if (!existsSync(stamp) || readFileSync(stamp, 'utf8') !== wanted) {
  const hasLock = existsSync(join(root, 'package-lock.json'));
  console.log(`Installing npm dependencies (${hasLock ? 'npm ci' : 'npm install'})…`);
  const res = spawnSync('npm', [hasLock ? 'ci' : 'install', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (res.status !== 0) process.exit(res.status ?? 1);
  writeFileSync(stamp, wanted);
}

// The command runs in a child with tsx's loader. Ctrl-C reaches the whole foreground group from
// the terminal; a signal sent to this process alone (e.g. `kill -INT <pid>`) is forwarded.
const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'server', 'cli', commands[command]), ...process.argv.slice(3)], {
  cwd: root,
  stdio: 'inherit',
});
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => child.kill(signal));
}
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
