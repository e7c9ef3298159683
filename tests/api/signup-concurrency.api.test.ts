/**
 * No overbooking, whatever the timing: many simultaneous sign-ups against the real PostgreSQL,
 * first through one app, then through two server processes sharing the database.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import type { Server } from 'node:http';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../../server/cli/stack.js';
import { Signup } from '../../server/db/entities/signup.entity.js';
import { buildUser, TEST_PASSWORD } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { freePort } from '../setup/free-port.js';
import { createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let server: Server;
beforeAll(async () => {
  t = await createTestApp();
  server = t.app.listen(0, '127.0.0.1');
});
afterAll(async () => {
  server.close();
  await t.close();
});

const body = { role: 'planter', waiver: { accepted: true, signedName: 'Racing Volunteer' } };

/** A signed-in agent: cookie jar plus CSRF token. */
async function signedIn(target: Server | string, email: string) {
  const agent = request.agent(target);
  const first = (await agent.get('/api/auth/csrf')).body.token as string;
  await agent.post('/api/auth/login').set('X-CSRF-Token', first).send({ email, password: TEST_PASSWORD }).expect(200);
  return { agent, token: (await agent.get('/api/auth/csrf')).body.token as string };
}

describe('simultaneous sign-ups', () => {
  it('gives exactly 10 places to 200 people signing up at once, and waitlists the rest in a single line', async () => {
    const w = await buildWorkday(t.db, { capacity: 10 });
    const users = await Promise.all(Array.from({ length: 200 }, () => buildUser(t.db)));
    const agents = [];
    for (const u of users) agents.push(await signedIn(server, u.email));
    const results = await Promise.all(agents.map((a) => a.agent.post(`/api/workdays/${w.id}/signups`).set('X-CSRF-Token', a.token).send(body)));
    expect(results.every((r) => r.status === 201)).toBe(true);
    expect(results.filter((r) => r.body.status === 'confirmed')).toHaveLength(10);
    const positions = results.filter((r) => r.body.status === 'waitlisted').map((r) => r.body.position as number).sort((a, b) => a - b);
    expect(positions).toEqual(Array.from({ length: 190 }, (_, i) => i + 1));
    expect(await t.db.getRepository(Signup).countBy({ workdayId: w.id, status: 'confirmed' })).toBe(10);
  }, 120_000);

  it('gives one person one place however many times they press the button at once', async () => {
    const w = await buildWorkday(t.db, { capacity: 10 });
    const u = await buildUser(t.db);
    const a = await signedIn(server, u.email);
    const results = await Promise.all(Array.from({ length: 20 }, () => a.agent.post(`/api/workdays/${w.id}/signups`).set('X-CSRF-Token', a.token).send(body)));
    expect(new Set(results.map((r) => r.body.id)).size).toBe(1);
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(await t.db.getRepository(Signup).countBy({ workdayId: w.id })).toBe(1);
  });
});

describe('two server processes on one database', () => {
  const children: ChildProcess[] = [];
  const urls: string[] = [];

  beforeAll(async () => {
    for (let i = 0; i < 2; i++) {
      const port = await freePort();
      const child = spawn(process.execPath, ['--import', 'tsx', join(projectRoot, 'server', 'main.ts')], {
        cwd: projectRoot,
        env: { ...process.env, PORT: String(port), LOG_REQUESTS: 'false' },
        stdio: ['ignore', 'pipe', 'pipe'],
      });
      children.push(child);
      let out = '';
      await new Promise<void>((resolve, reject) => {
        const timer = setTimeout(() => reject(new Error(`server ${i} did not start:\n${out}`)), 60_000);
        const onData = (d: Buffer) => {
          out += d.toString();
          if (out.includes('listening on')) {
            clearTimeout(timer);
            resolve();
          }
        };
        child.stdout?.on('data', onData);
        child.stderr?.on('data', onData);
      });
      urls.push(`http://127.0.0.1:${port}`);
    }
  }, 120_000);

  afterAll(() => {
    for (const c of children) c.kill('SIGTERM');
  });

  it('still gives exactly the capacity when sign-ups arrive through both', async () => {
    const w = await buildWorkday(t.db, { capacity: 7 });
    const users = await Promise.all(Array.from({ length: 60 }, () => buildUser(t.db)));
    const agents = [];
    for (const [i, u] of users.entries()) agents.push(await signedIn(urls[i % 2]!, u.email));
    const results = await Promise.all(agents.map((a) => a.agent.post(`/api/workdays/${w.id}/signups`).set('X-CSRF-Token', a.token).send(body)));
    expect(results.every((r) => r.status === 201)).toBe(true);
    expect(results.filter((r) => r.body.status === 'confirmed')).toHaveLength(7);
    expect(await t.db.getRepository(Signup).countBy({ workdayId: w.id, status: 'confirmed' })).toBe(7);
  }, 120_000);
});
