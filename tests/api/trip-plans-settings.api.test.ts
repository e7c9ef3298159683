import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { DEFAULT_TRIP_RULES } from '../../shared/schemas/organisation.schema.js';
import { Craft } from '../../server/db/entities/craft.entity.js';
import { Organisation } from '../../server/db/entities/organisation.entity.js';
import { instanceFromJson, runFromJson, validateTripPlan, type TripInstanceJson, type TripPlanJson, type TripRunJson } from '../../server/domain/trips/index.js';
import { buildCraft } from '../factories/craft.factory.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  // Its own database: these tests change the organisation's trip settings and the active fleet.
  t = await createTestApp({ ownDatabase: 'trip_plans_settings' });
});
afterAll(() => t.close());
beforeEach(async () => {
  await t.db.createQueryBuilder().update(Craft).set({ active: false }).where('active = true').execute();
});
afterEach(async () => {
  await t.db.getRepository(Organisation).update({ id: 1 }, { tripRules: DEFAULT_TRIP_RULES });
});

const sum = (xs: readonly number[]) => xs.reduce((n, x) => n + x, 0);
const sorted = (xs: readonly number[]) => [...xs].sort((a, b) => a - b);

/** A 3-hour workday 800 m from the launch, two paddlers and a planter, and the given trees. */
async function workdayWith(trees: (number | null)[]) {
  const site = await buildSite(t.db, { launchDistanceM: 800 });
  const workday = await buildWorkday(t.db, { siteId: site.id, startsAt: new Date('2026-05-04T13:00:00Z'), endsAt: new Date('2026-05-04T16:00:00Z') });
  const people = await Promise.all([1, 2, 3].map(() => buildUser(t.db)));
  for (const [i, user] of people.entries()) await buildSignup(t.db, { workdayId: workday.id, userId: user.id, role: i < 2 ? 'seat' : 'planter' });
  for (const potMassKg of trees) await buildTree(t.db, { reservedWorkdayId: workday.id, potMassKg });
  return workday;
}

async function build(workdayId: string, body: object = {}) {
  const { agent, token } = await authAgentFor(t, 'coordinator');
  const res = await agent.post(`/api/workdays/${workdayId}/trip-plan`).set('X-CSRF-Token', token).send(body);
  expect(res.status).toBe(201);
  return { ...(res.body as { instance: TripInstanceJson; plan: TripPlanJson }), agent, token };
}

describe('the workday plan uses the organisation’s trip settings', () => {
  it('takes margins, weights, times and pot mass from the settings; a request value overrides', async () => {
    const rules = { paddlecraftMargin: 0.6, platedMargin: 0.9, standardPersonKg: 90, plantingMinutesPerTree: 15, potMassKg: 30, loadMinutes: 12, unloadMinutes: 6 };
    const { agent: admin, token } = await authAgentFor(t, 'admin');
    await admin.patch('/api/organisation/settings').set('X-CSRF-Token', token).send({ tripRules: rules }).expect(200);
    await buildCraft(t.db, { potSlots: 4 });
    const workday = await workdayWith([null, null]);

    const { instance } = await build(workday.id);
    expect(instance).toMatchObject({
      route: { distanceKm: 0.8, loadMinutes: 12, unloadMinutes: 6 },
      plantingMinutesPerTree: 15,
      loadMargin: { paddlecraft: 0.6, plated: 0.9 },
      standardPersonKg: 90,
      pots: { count: 2, massKg: 30 },
    });
    const overridden = await build(workday.id, { plantingMinutesPerTree: 5, potMassKg: 22 });
    expect(overridden.instance).toMatchObject({ plantingMinutesPerTree: 5, pots: { count: 2, massKg: 22 }, loadMargin: { paddlecraft: 0.6 } });
  });

  it('passes each craft’s capacity plate to the planner', async () => {
    const plated = await buildCraft(t.db, { kind: 'skiff', hasCapacityPlate: true, needsOperator: false });
    const rated = await buildCraft(t.db, { kind: 'skiff', hasCapacityPlate: false, needsOperator: false });
    const { instance } = await build((await workdayWith([])).id);
    expect(instance.craft.find((c) => c.id === plated.id)).toMatchObject({ plated: true });
    expect(instance.craft.find((c) => c.id === rated.id)).toMatchObject({ plated: false });
  });
});

describe('per-tree pot masses', () => {
  it('plans each reserved tree at its recorded pot mass, and keeps the masses through a hand edit', async () => {
    // One canoe (2 seats, 350 kg → 245 kg at 70 %, 4 pot slots) and three trees: 31.5 and 24 kg
    // recorded, the third at the default 27 kg. Each run's load is the people aboard at the
    // standard weight plus its pots' own masses.
    await buildCraft(t.db, { potSlots: 4 });
    const workday = await workdayWith([31.5, 24, null]);
    const { instance, plan, agent, token } = await build(workday.id);
    expect(instance.pots.count).toBe(3);
    expect(instance.pots.massKg).toBe(27);
    expect(sorted(instance.pots.masses ?? [])).toEqual([24, 31.5]);
    expect(sorted(plan.runs.flatMap((r) => r.potMassesKg ?? []))).toEqual([24, 27, 31.5]);
    const standard = instance.standardPersonKg ?? 0;
    for (const r of plan.runs) expect(r.loadKg).toBeCloseTo(r.people.length * standard + sum(r.potMassesKg ?? []), 9);
    expect(validateTripPlan(instanceFromJson(instance), { runs: plan.runs.map(runFromJson) })).toEqual([]);

    // The trip board sends counts only; the server hands the pots out again and reports them.
    const countsOnly: TripRunJson[] = plan.runs.map(({ potMassesKg: _m, ...r }) => r);
    const saved = await agent.put(`/api/workdays/${workday.id}/trip-plan`).set('X-CSRF-Token', token).send({ runs: countsOnly });
    expect(saved.status).toBe(200);
    const edited = saved.body.plan as TripPlanJson;
    expect(sorted(edited.runs.flatMap((r) => r.potMassesKg ?? []))).toEqual([24, 27, 31.5]);
    for (const r of edited.runs) expect(r.loadKg).toBeCloseTo(r.people.length * standard + sum(r.potMassesKg ?? []), 9);
    expect((await agent.get(`/api/workdays/${workday.id}/trip-plan`)).body.plan).toEqual(edited);
  });
});

describe('POST /api/trip-plans/solve under load', () => {
  it('answers six plans sent at once, each from the solver and valid', async () => {
    const { agent, token } = await authAgentFor(t, 'coordinator');
    const instance = (pots: number): TripInstanceJson => ({
      window: { start: '2026-03-02T14:00:00.000Z', end: '2026-03-02T17:00:00.000Z' },
      route: { distanceKm: 1, loadMinutes: 10, unloadMinutes: 5 },
      plantingMinutesPerTree: 10,
      craft: [{ id: 'canoe-1', kind: 'canoe', seats: 2, maxLoadKg: 350, potSlots: 6, speedKmh: 4, needsOperator: false }],
      people: [{ id: 'ann', skills: ['paddler'] }, { id: 'ben', skills: ['paddler'] }],
      pots: { count: pots, massKg: 25 },
    });
    const sizes = [1, 2, 3, 4, 5, 6];
    const answers = await Promise.all(sizes.map((n) => agent.post('/api/trip-plans/solve').set('X-CSRF-Token', token).send(instance(n))));
    answers.forEach((res, i) => {
      expect(res.status).toBe(200);
      const plan = res.body.plan as TripPlanJson;
      expect(plan.solver).toBe('highs');
      expect(plan.warnings.join(' ')).not.toMatch(/did not answer/);
      expect(sum(plan.runs.map((r) => r.pots))).toBe(sizes[i]);
      expect(validateTripPlan(instanceFromJson(instance(sizes[i] ?? 0)), { runs: plan.runs.map(runFromJson) })).toEqual([]);
    });
  }, 60_000);
});
