/**
 * The tsc output, not only the tsx/vitest path: decorators, relation types and ESM import
 * order can break compiled code in ways the test runner's transform hides.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../../server/cli/stack.js';
import { freePort } from '../setup/free-port.js';

let child: ChildProcess | undefined;
let base = '';


beforeAll(async () => {
  const tsc = spawnSync(process.execPath, [join(projectRoot, 'node_modules', 'typescript', 'bin', 'tsc'), '-p', 'server/tsconfig.build.json'], { cwd: projectRoot, encoding: 'utf8' });
  expect(tsc.stdout + tsc.stderr).toBe('');
  const port = await freePort();
  base = `http://127.0.0.1:${port}`;
  child = spawn(process.execPath, [join(projectRoot, 'dist', 'server', 'main.js')], {
    cwd: projectRoot,
    env: { ...process.env, PORT: String(port), LOG_REQUESTS: 'false' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`compiled server did not start:\n${output}`)), 30_000);
    const onData = (d: Buffer) => {
      output += d.toString();
      if (output.includes('listening on')) {
        clearTimeout(timer);
        resolve();
      }
    };
    child?.stdout?.on('data', onData);
    child?.stderr?.on('data', onData);
    child?.once('exit', (code) => reject(new Error(`compiled server exited with ${code}:\n${output}`)));
  });
}, 120_000);

afterAll(() => {
  child?.kill('SIGTERM');
});

describe('compiled server (dist/server/main.js)', () => {
  it('answers health after a database round trip', async () => {
    const res = await fetch(`${base}/api/health`);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ status: 'ok', db: 'ok' });
  });

  it('loads entities and sessions: a signed-out /me is a 401 in the shared shape', async () => {
    const res = await fetch(`${base}/api/auth/me`);
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ error: { code: 'unauthenticated' } });
  });

  it('stops cleanly on SIGTERM', async () => {
    const exited = new Promise<number | null>((resolve) => child?.once('exit', (code) => resolve(code)));
    child?.kill('SIGTERM');
    expect(await exited).toBe(0);
  });
});
