import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { CheckResult, MonitoringDueDto, VisitDetail, VisitDto } from '../../shared/schemas/outcomes.schema.js';
import { TreeCheck } from '../../server/db/entities/tree-check.entity.js';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { addMonths } from '../../server/domain/outcomes/milestones.js';
import { localDate } from '../../server/domain/tide/time-zone.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp();
  staff = await authAgentFor(t, 'coordinator');
});
afterAll(() => t.close());

const NO_ID = '00000000-0000-4000-8000-000000000000';
const today = () => localDate(Date.now(), 'America/New_York');
const DAY = 86_400_000;
const daysAgo = (n: number) => localDate(Date.now() - n * DAY, 'America/New_York');

const createVisit = (body: object) => staff.agent.post('/api/monitoring-visits').set('X-CSRF-Token', staff.token).send(body);
const putCheck = (visitId: string, treeId: string, body: object) => staff.agent.put(`/api/monitoring-visits/${visitId}/checks/${treeId}`).set('X-CSRF-Token', staff.token).send(body);

/** A site with two trees planted 40 days ago, one planted yesterday, and one at another site. */
async function plantedSite() {
  const site = await buildSite(t.db);
  const other = await buildSite(t.db);
  const planted = { stage: 'planted' as const, siteId: site.id, plantedOn: daysAgo(40), plantedBedElevationM: 0.2 };
  const a = await buildTree(t.db, planted);
  const b = await buildTree(t.db, planted);
  const late = await buildTree(t.db, { ...planted, plantedOn: daysAgo(1) });
  const elsewhere = await buildTree(t.db, { ...planted, siteId: other.id });
  const visit = VisitDto.parse((await createVisit({ siteId: site.id, visitedOn: daysAgo(5), notes: 'Calm, low tide at 08:10' })).body.visit);
  return { site, a, b, late, elsewhere, visit };
}

describe('POST /api/monitoring-visits', () => {
  it('creates a visit, ad hoc or on a monitoring workday at the site', async () => {
    const site = await buildSite(t.db);
    const res = await createVisit({ siteId: site.id, visitedOn: today() });
    expect(res.status).toBe(201);
    expect(VisitDto.parse(res.body.visit)).toMatchObject({ siteId: site.id, siteName: site.name, workdayId: null, counts: { checked: 0 } });
    const workday = await buildWorkday(t.db, { siteId: site.id, kind: 'monitoring' });
    expect((await createVisit({ siteId: site.id, workdayId: workday.id, visitedOn: today() })).status).toBe(201);
  });

  it.each([
    ['an unknown site', async () => ({ siteId: NO_ID, visitedOn: today() }), 'siteId'],
    ['a future date', async () => ({ siteId: (await buildSite(t.db)).id, visitedOn: localDate(Date.now() + 3 * DAY, 'America/New_York') }), 'visitedOn'],
    ['a planting workday', async () => {
      const site = await buildSite(t.db);
      return { siteId: site.id, workdayId: (await buildWorkday(t.db, { siteId: site.id })).id, visitedOn: today() };
    }, 'workdayId'],
    ['a workday at another site', async () => ({ siteId: (await buildSite(t.db)).id, workdayId: (await buildWorkday(t.db, { kind: 'monitoring' })).id, visitedOn: today() }), 'workdayId'],
    ['a malformed date', async () => ({ siteId: NO_ID, visitedOn: 'yesterday' }), 'visitedOn'],
  ])('refuses %s with 400 on the field', async (_name, body, field) => {
    const res = await createVisit(await body());
    expect(res.status).toBe(400);
    expect(Object.keys(ErrorBody.parse(res.body).error.fields ?? {})).toContain(field);
  });
});

describe('GET /api/monitoring-visits/:id and checks', () => {
  it('lists the site\'s trees planted by the visit date, and records checks tree by tree', async () => {
    const { site, a, b, visit } = await plantedSite();
    const detail = VisitDetail.parse((await staff.agent.get(`/api/monitoring-visits/${visit.id}`)).body);
    expect(detail.trees.map((x) => x.id).sort()).toEqual([a.id, b.id].sort());
    expect(detail.trees.every((x) => x.check === null)).toBe(true);

    const alive = CheckResult.parse((await putCheck(visit.id, a.id, { condition: 'alive', heightCm: 64 })).body);
    expect(alive.tree).toMatchObject({ id: a.id, stage: 'alive', check: { condition: 'alive', heightCm: 64 } });
    const lost = CheckResult.parse((await putCheck(visit.id, b.id, { condition: 'lost', notes: 'Pot tipped over' })).body);
    expect(lost).toMatchObject({ tree: { stage: 'lost' }, counts: { alive: 1, lost: 1, missing: 0, checked: 2 } });
    expect(await t.db.getRepository(TreeEvent).findOneBy({ treeId: b.id, kind: 'stage', toStage: 'lost' })).toMatchObject({ fromStage: 'planted', byId: staff.user.id });

    // The lost tree stays on this visit's list; a new visit no longer lists it.
    const again = VisitDetail.parse((await staff.agent.get(`/api/monitoring-visits/${visit.id}`)).body);
    expect(again.trees.find((x) => x.id === b.id)?.check?.condition).toBe('lost');
    const next = VisitDto.parse((await createVisit({ siteId: site.id, visitedOn: today() })).body.visit);
    const nextTrees = VisitDetail.parse((await staff.agent.get(`/api/monitoring-visits/${next.id}`)).body).trees.map((x) => x.id);
    expect(nextTrees).toContain(a.id);
    expect(nextTrees).not.toContain(b.id);
  });

  it('replaces a check on a second PUT, and a missing tree keeps its stage', async () => {
    const { a, visit } = await plantedSite();
    await putCheck(visit.id, a.id, { condition: 'alive' }).expect(200);
    const res = await putCheck(visit.id, a.id, { condition: 'missing', notes: 'Not found by the marker' });
    expect(CheckResult.parse(res.body).tree).toMatchObject({ stage: 'planted', check: { condition: 'missing', notes: 'Not found by the marker' } });
    expect(await t.db.getRepository(TreeCheck).countBy({ visitId: visit.id, treeId: a.id })).toBe(1);
  });

  it('refuses trees of another site or planted after the visit, bad conditions and unknown photos, changing nothing', async () => {
    const { a, late, elsewhere, visit } = await plantedSite();
    expect((await putCheck(visit.id, elsewhere.id, { condition: 'alive' })).status).toBe(409);
    expect((await putCheck(visit.id, late.id, { condition: 'alive' })).status).toBe(409);
    expect((await putCheck(visit.id, a.id, { condition: 'dead' })).status).toBe(400);
    const photo = await putCheck(visit.id, a.id, { condition: 'alive', photoId: NO_ID });
    expect(ErrorBody.parse(photo.body).error.fields).toEqual({ photoId: ['is not an uploaded photo'] });
    expect((await putCheck(NO_ID, a.id, { condition: 'alive' })).status).toBe(404);
    expect(await t.db.getRepository(TreeCheck).countBy({ visitId: visit.id })).toBe(0);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: a.id })).stage).toBe('planted');
  });

  it('finds a planted tree of the site by its tag, however it is typed', async () => {
    const { a, late, elsewhere, visit } = await plantedSite();
    const res = await staff.agent.get(`/api/monitoring-visits/${visit.id}/lookup`).query({ tag: ` ${a.tag.toLowerCase()} ` });
    expect(res.status).toBe(200);
    expect(res.body.tree).toMatchObject({ id: a.id, check: null });
    expect((await staff.agent.get(`/api/monitoring-visits/${visit.id}/lookup`).query({ tag: elsewhere.tag })).status).toBe(404);
    expect((await staff.agent.get(`/api/monitoring-visits/${visit.id}/lookup`).query({ tag: late.tag })).status).toBe(404);
    expect((await staff.agent.get(`/api/monitoring-visits/${visit.id}/lookup`).query({ tag: '' })).status).toBe(400);
  });
});

describe('GET /api/monitoring-visits', () => {
  it('filters by site and dates, newest first, with counts', async () => {
    const { site, a, visit } = await plantedSite();
    await putCheck(visit.id, a.id, { condition: 'alive' }).expect(200);
    const newer = VisitDto.parse((await createVisit({ siteId: site.id, visitedOn: today() })).body.visit);
    const res = await staff.agent.get('/api/monitoring-visits').query({ siteId: site.id });
    expect(res.body.visits.map((v: { id: string }) => v.id)).toEqual([newer.id, visit.id]);
    expect(res.body.visits[1].counts).toEqual({ alive: 1, lost: 0, missing: 0, checked: 1 });
    const older = await staff.agent.get('/api/monitoring-visits').query({ siteId: site.id, to: daysAgo(2) });
    expect(older.body.visits.map((v: { id: string }) => v.id)).toEqual([visit.id]);
    expect((await staff.agent.get('/api/monitoring-visits').query({ from: today(), to: daysAgo(2) })).status).toBe(400);
  });
});

describe('GET /api/monitoring/due', () => {
  it('names a cohort whose one-month check is due, and drops it once every tree is checked', async () => {
    const site = await buildSite(t.db);
    // Planted one month ago today: the 1-month milestone is today.
    const plantedOn = addMonths(today(), -1);
    const trees = await Promise.all([1, 2].map(() => buildTree(t.db, { stage: 'planted', siteId: site.id, plantedOn })));
    const due = MonitoringDueDto.parse((await staff.agent.get('/api/monitoring/due')).body);
    const mine = due.sites.find((s) => s.siteId === site.id);
    expect(mine).toMatchObject({ siteName: site.name, lastVisitOn: null, cohorts: [{ plantedOn, months: 1, status: 'due', trees: 2, checked: 0 }] });
    const visit = VisitDto.parse((await createVisit({ siteId: site.id, visitedOn: today() })).body.visit);
    for (const tree of trees) await putCheck(visit.id, tree.id, { condition: 'alive' }).expect(200);
    const after = MonitoringDueDto.parse((await staff.agent.get('/api/monitoring/due')).body);
    expect(after.sites.find((s) => s.siteId === site.id)).toBeUndefined();
  });
});
