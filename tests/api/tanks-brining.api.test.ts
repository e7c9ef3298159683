/**
 * Brining plans and the day's swaps on a fixed clock (1 June 2026, 10:00 in the organisation's
 * New York time zone). Volumes follow the mass balance x = V·(C1 − C0)/(Cs − C0) of TRADE.md §4,
 * whose worked example is 18.93 L (5 US gal) from 10 to 15 ppt with 35-ppt stock → 3.79 L.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { buildSite } from '../factories/site.factory.js';
import { buildReading, buildTank } from '../factories/tank.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

const NOW = new Date('2026-06-01T14:00:00Z');
let t: TestApp;
let volunteer: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp({ clock: () => NOW });
  volunteer = await authAgentFor(t, 'volunteer');
});
afterAll(() => t.close());

const daysAgo = (n: number) => new Date(NOW.getTime() - n * 86_400_000);

describe('GET /api/tanks/:id/brining-plan', () => {
  it('plans a 5-gallon tank from 10 to 30 ppt: four 5-ppt swaps of 35-ppt water, 4 days apart, then the 21-day hold', async () => {
    const tank = await buildTank(t.db, { volumeLitres: 18.93 });
    await buildReading(t.db, tank.id, 10, daysAgo(1));
    const res = await volunteer.agent.get(`/api/tanks/${tank.id}/brining-plan?targetPpt=30`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ tankId: tank.id, currentPpt: 10, targetPpt: 30, startDate: '2026-06-01', reachedOn: '2026-06-13', readyOn: '2026-07-04', warnings: [] });
    expect(res.body.steps).toEqual([
      { date: '2026-06-01', fromPpt: 10, toPpt: 15, replaceLitres: 3.79, stockPpt: 35 },
      { date: '2026-06-05', fromPpt: 15, toPpt: 20, replaceLitres: 4.73, stockPpt: 35 },
      { date: '2026-06-09', fromPpt: 20, toPpt: 25, replaceLitres: 6.31, stockPpt: 35 },
      { date: '2026-06-13', fromPpt: 25, toPpt: 30, replaceLitres: expect.closeTo(9.465, 1), stockPpt: 35 },
    ]);
  });

  it('aims at the target site\'s salinity by default and warns when the workday is too soon', async () => {
    const site = await buildSite(t.db, { salinityPpt: 30 });
    const tank = await buildTank(t.db, { volumeLitres: 18.93, targetSiteId: site.id });
    await buildReading(t.db, tank.id, 10, daysAgo(0));
    const res = await volunteer.agent.get(`/api/tanks/${tank.id}/brining-plan?by=2026-06-20`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ targetPpt: 30, readyOn: '2026-07-04', warnings: [{ code: 'workday_too_soon', message: expect.stringContaining('14 days') }] });
  });

  it('waits the interval after the last swap the readings show', async () => {
    const tank = await buildTank(t.db, { volumeLitres: 20 });
    await buildReading(t.db, tank.id, 10, daysAgo(12));
    await buildReading(t.db, tank.id, 15, daysAgo(2));
    const res = await volunteer.agent.get(`/api/tanks/${tank.id}/brining-plan?targetPpt=25`);
    expect(res.body).toMatchObject({ currentPpt: 15, startDate: '2026-06-03' });
  });

  it('says when there is no target, no reading, or stock that cannot reach the target', async () => {
    const tank = await buildTank(t.db);
    const noReading = await volunteer.agent.get(`/api/tanks/${tank.id}/brining-plan?targetPpt=30`);
    expect(noReading.status).toBe(400);
    expect(ErrorBody.parse(noReading.body).error.fields).toHaveProperty('tankId');
    await buildReading(t.db, tank.id, 10, daysAgo(1));
    const noTarget = await volunteer.agent.get(`/api/tanks/${tank.id}/brining-plan`);
    expect(noTarget.status).toBe(400);
    expect(ErrorBody.parse(noTarget.body).error.fields).toHaveProperty('targetPpt');
    const weakStock = await volunteer.agent.get(`/api/tanks/${tank.id}/brining-plan?targetPpt=30&stockPpt=25`);
    expect(weakStock.status).toBe(400);
    expect(ErrorBody.parse(weakStock.body).error.fields).toHaveProperty('stockPpt');
  });
});

describe('GET /api/nursery/tasks', () => {
  it('lists the day\'s swaps of tanks brining toward a site, as lines a volunteer can follow', async () => {
    const site = await buildSite(t.db, { salinityPpt: 30 });
    const tank = await buildTank(t.db, { name: `B-${Math.random().toString(36).slice(2, 7)}`, volumeLitres: 18.93, targetSiteId: site.id });
    await buildReading(t.db, tank.id, 10, daysAgo(1));
    const today = await volunteer.agent.get('/api/nursery/tasks');
    expect(today.status).toBe(200);
    expect(today.body.date).toBe('2026-06-01');
    expect(today.body.tasks.filter((x: { tankId: string }) => x.tankId === tank.id)).toEqual([
      { tankId: tank.id, tankName: tank.name, date: '2026-06-01', fromPpt: 10, toPpt: 15, replaceLitres: 3.79, stockPpt: 35, message: `replace 3.8 L in tank ${tank.name} with 35 ppt water` },
    ]);
    const later = await volunteer.agent.get('/api/nursery/tasks?date=2026-06-05');
    expect(later.body.tasks.filter((x: { tankId: string }) => x.tankId === tank.id)).toEqual([expect.objectContaining({ fromPpt: 15, toPpt: 20 })]);
    const restDay = await volunteer.agent.get('/api/nursery/tasks?date=2026-06-02');
    expect(restDay.body.tasks.filter((x: { tankId: string }) => x.tankId === tank.id)).toEqual([]);
  });

  it('skips a tank without a reading and says why', async () => {
    const site = await buildSite(t.db, { salinityPpt: 30 });
    const tank = await buildTank(t.db, { targetSiteId: site.id });
    const res = await volunteer.agent.get('/api/nursery/tasks');
    expect(res.body.skipped).toContainEqual({ tankId: tank.id, tankName: tank.name, reason: 'No salinity reading yet.' });
  });

  it('rejects a malformed date', async () => {
    const res = await volunteer.agent.get('/api/nursery/tasks?date=June');
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('date');
  });
});
