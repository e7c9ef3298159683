import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Organisation } from '../../server/db/entities/organisation.entity.js';
import { Site } from '../../server/db/entities/site.entity.js';
import { User } from '../../server/db/entities/user.entity.js';
import { DEMO_PASSWORD, demoPeople } from '../../server/db/seeds/demo-people.js';
import { demoSites } from '../../server/db/seeds/demo-sites.js';
import { seedDemo } from '../../server/db/seeds/demo.seed.js';
import { createPasswordHasher } from '../../server/services/password-hasher.js';
import { createTideStationDirectory } from '../../server/adapters/tide-stations.js';
import { Workday } from '../../server/db/entities/workday.entity.js';
import { createTestApp, csrfAgent, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('demo seed', () => {
  it('seeds the demo organisation once; a second run adds nothing', async () => {
    const hasher = createPasswordHasher(10);
    const now = new Date('2026-12-01T12:00:00Z');
    const stations = createTideStationDirectory();
    const first = await seedDemo({ db: t.db, hasher, now, stations });
    expect(first.workdays).toBe(4);
    // Other test files may have made trees already; the demo nursery is then skipped.
    expect([0, 150]).toContain(first.trees);
    const workdays = await t.db.getRepository(Workday).count();
    const users = await t.db.getRepository(User).count();
    const sites = await t.db.getRepository(Site).count();
    const second = await seedDemo({ db: t.db, hasher, now, stations });
    expect(second).toEqual({ created: 0, workdays: 0, trees: 0 });
    expect(await t.db.getRepository(Workday).count()).toBe(workdays);
    expect(await t.db.getRepository(User).count()).toBe(users);
    expect(await t.db.getRepository(Site).count()).toBe(sites);
    for (const s of demoSites) expect(await t.db.getRepository(Site).countBy({ name: s.name })).toBe(1);
    expect(await t.db.getRepository(User).countBy({ email: demoPeople[0]!.email })).toBe(1);
    expect(await t.db.getRepository(Organisation).findOneByOrFail({ id: 1 })).toMatchObject({ name: 'Bayhaven Shoreline Trust', isDemo: true });
  });

  it('lets the documented demo sign-ins in with the demo password', async () => {
    for (const email of ['admin@demo.ebbroot.test', 'coordinator@demo.ebbroot.test', 'volunteer@demo.ebbroot.test']) {
      const { agent, token } = await csrfAgent(t.app);
      const res = await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email, password: DEMO_PASSWORD });
      expect(res.status).toBe(200);
      expect(res.body.user.role).toBe(email.split('@')[0]);
    }
  });
});
