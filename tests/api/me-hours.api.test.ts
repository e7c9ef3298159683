import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildSignup } from '../factories/signup.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** A completed workday starting at `iso`, 4 hours long; the person checked in (or not) and the trees it planted. */
async function dayOn(userId: string, iso: string, opts: { kind?: 'planting' | 'nursery'; checkedIn: boolean; planted: number }) {
  const startsAt = new Date(iso);
  const endsAt = new Date(startsAt.getTime() + 4 * 3_600_000);
  const w = await buildWorkday(t.db, { kind: opts.kind ?? 'planting', status: 'completed', startsAt, endsAt, title: `Day ${iso.slice(0, 10)}` });
  await buildSignup(t.db, {
    workdayId: w.id, userId, ...(opts.checkedIn ? { checkedInAt: startsAt, checkedOutAt: endsAt } : { noShow: true }),
  });
  for (let i = 0; i < opts.planted; i++) await buildTree(t.db, { stage: 'planted', plantedWorkdayId: w.id });
  return w;
}

describe('GET /api/me/hours: trees planted by crews I was on', () => {
  it('counts the trees of planting days I was checked in at, within the period', async () => {
    const { agent, user } = await authAgentFor(t, 'volunteer');
    const spring = await dayOn(user.id, '2025-03-15T13:00:00Z', { checkedIn: true, planted: 3 });
    // Reserved for the day but never recorded as planted: not counted.
    await buildTree(t.db, { stage: 'ready', reservedWorkdayId: spring.id });
    const missed = await dayOn(user.id, '2025-04-10T13:00:00Z', { checkedIn: false, planted: 5 });
    const potting = await dayOn(user.id, '2025-05-02T13:00:00Z', { kind: 'nursery', checkedIn: true, planted: 0 });
    await dayOn(user.id, '2024-11-20T14:00:00Z', { checkedIn: true, planted: 2 });

    const res = await agent.get('/api/me/hours?from=2025-01-01&to=2026-01-01');

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ totalMinutes: 480, workdaysAttended: 2, crewTreesPlanted: 3 });
    const byId = new Map((res.body.rows as { workdayId: string; crewTreesPlanted: number }[]).map((r) => [r.workdayId, r.crewTreesPlanted]));
    expect(Object.fromEntries(byId)).toEqual({ [spring.id]: 3, [missed.id]: 0, [potting.id]: 0 });
    expect((await agent.get('/api/me/hours')).body.crewTreesPlanted).toBe(5);
  });

  it('stops counting a tree once its planting record is undone', async () => {
    const { agent, user } = await authAgentFor(t, 'volunteer');
    const w = await dayOn(user.id, '2025-06-01T12:00:00Z', { checkedIn: true, planted: 2 });
    const [first] = await t.db.query<{ id: string }[]>('SELECT id FROM tree WHERE planted_workday_id = $1 LIMIT 1', [w.id]);
    await t.db.query('UPDATE tree SET planted_workday_id = NULL, stage = $2 WHERE id = $1', [first!.id, 'ready']);

    const res = await agent.get('/api/me/hours?from=2025-06-01&to=2025-06-02');

    expect(res.body).toMatchObject({ crewTreesPlanted: 1, rows: [{ workdayId: w.id, crewTreesPlanted: 1 }] });
  });

  it('answers 0 for a volunteer with no workdays', async () => {
    const { agent } = await authAgentFor(t, 'volunteer');
    const res = await agent.get('/api/me/hours');
    expect(res.body).toEqual({ rows: [], totalMinutes: 0, totalHours: 0, workdaysAttended: 0, crewTreesPlanted: 0 });
  });
});
