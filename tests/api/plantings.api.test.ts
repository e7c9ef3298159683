import { In } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { PlantingList, PlantingResult } from '../../shared/schemas/outcomes.schema.js';
import { MonitoringVisit } from '../../server/db/entities/monitoring-visit.entity.js';
import { TreeCheck } from '../../server/db/entities/tree-check.entity.js';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTank } from '../factories/tank.factory.js';
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

const DAY = 86_400_000;
const NO_ID = '00000000-0000-4000-8000-000000000000';
/** A planting workday two days ago, 09:00–13:00 New York time (13:00–17:00 UTC in summer or 14:00–18:00 in winter: both the same local date). */
async function pastPlanting(overrides: Parameters<typeof buildWorkday>[1] = {}) {
  const day = new Date(Date.now() - 2 * DAY).toISOString().slice(0, 10);
  const site = await buildSite(t.db, { bedElevationM: 0.25 });
  const workday = await buildWorkday(t.db, { siteId: site.id, startsAt: new Date(`${day}T14:00:00Z`), endsAt: new Date(`${day}T18:00:00Z`), ...overrides });
  return { site, workday, day };
}
const record = (workdayId: string, body: object) => staff.agent.post(`/api/workdays/${workdayId}/plantings`).set('X-CSRF-Token', staff.token).send(body);
const treesById = async (ids: string[]) => new Map((await t.db.getRepository(Tree).findBy({ id: In(ids) })).map((x) => [x.id, x]));
const snapshot = async (ids: string[]) => [...(await treesById(ids)).values()].map((x) => [x.id, x.stage, x.siteId, x.plantedOn, x.plantedWorkdayId, x.tankId]).sort();

describe('GET /api/workdays/:id/plantings', () => {
  it('lists the reserved trees with the site bed elevation as the suggestion', async () => {
    const { site, workday, day } = await pastPlanting();
    const tree = await buildTree(t.db, { stage: 'ready', reservedWorkdayId: workday.id });
    const res = await staff.agent.get(`/api/workdays/${workday.id}/plantings`);
    expect(res.status).toBe(200);
    const body = PlantingList.parse(res.body);
    expect(body.workday).toMatchObject({ id: workday.id, localDate: day });
    expect(body.site).toMatchObject({ id: site.id, bedElevationM: 0.25 });
    expect(body.trees).toEqual([expect.objectContaining({ id: tree.id, reserved: true, planted: false, suggestedBedElevationM: 0.25 })]);
  });
});

describe('POST /api/workdays/:id/plantings', () => {
  it('plants reserved and ready trees at the site, on the workday\'s date, with who in the history', async () => {
    const { site, workday, day } = await pastPlanting({ status: 'completed' });
    const tank = await buildTank(t.db);
    const reserved = await buildTree(t.db, { stage: 'brining', reservedWorkdayId: workday.id, tankId: tank.id });
    const ready = await buildTree(t.db, { stage: 'ready' });
    const res = await record(workday.id, { trees: [{ treeId: reserved.id }, { treeId: ready.id, bedElevationM: 0.31 }] });
    expect(res.status).toBe(200);
    const body = PlantingResult.parse(res.body);
    expect(body).toMatchObject({ recorded: 2, unchanged: 0 });
    expect(body.trees.filter((x) => x.planted)).toHaveLength(2);
    const after = await treesById([reserved.id, ready.id]);
    expect(after.get(reserved.id)).toMatchObject({ stage: 'planted', siteId: site.id, plantedOn: day, plantedBedElevationM: 0.25, plantedWorkdayId: workday.id, tankId: null });
    expect(after.get(ready.id)).toMatchObject({ stage: 'planted', plantedBedElevationM: 0.31 });
    const events = await t.db.getRepository(TreeEvent).findBy({ treeId: In([reserved.id, ready.id]), kind: 'stage' });
    expect(events.map((e) => [e.treeId, e.fromStage, e.toStage, e.byId]).sort()).toEqual([[reserved.id, 'brining', 'planted', staff.user.id], [ready.id, 'ready', 'planted', staff.user.id]].sort());
  });

  it('changes nothing when the same trees are recorded again, even twice at once', async () => {
    const { workday } = await pastPlanting();
    const trees = await Promise.all([1, 2, 3].map(() => buildTree(t.db, { stage: 'ready', reservedWorkdayId: workday.id })));
    const body = { trees: trees.map((x) => ({ treeId: x.id })) };
    const [a, b] = await Promise.all([record(workday.id, body), record(workday.id, body)]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect([a.body.recorded, b.body.recorded].sort()).toEqual([0, 3]);
    const again = await record(workday.id, body);
    expect(again.body).toMatchObject({ recorded: 0, unchanged: 3 });
    expect(await t.db.getRepository(TreeEvent).countBy({ treeId: In(trees.map((x) => x.id)), kind: 'stage' })).toBe(3);
  });

  it('needs allowUnready for an unreserved potted tree, and changes nothing without it', async () => {
    const { workday } = await pastPlanting();
    const ok = await buildTree(t.db, { stage: 'ready' });
    const potted = await buildTree(t.db, { stage: 'potted' });
    const before = await snapshot([ok.id, potted.id]);
    const res = await record(workday.id, { trees: [{ treeId: ok.id }, { treeId: potted.id }] });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields?.trees).toEqual([`${potted.tag} is potted and not reserved for this workday; set allowUnready to record it anyway`]);
    expect(await snapshot([ok.id, potted.id])).toEqual(before);
    const forced = await record(workday.id, { allowUnready: true, trees: [{ treeId: ok.id }, { treeId: potted.id }] });
    expect(forced.body).toMatchObject({ recorded: 2 });
  });

  it('answers 409 for a tree promised to another workday and changes nothing', async () => {
    const { workday } = await pastPlanting();
    const other = await buildWorkday(t.db);
    const free = await buildTree(t.db, { stage: 'ready' });
    const taken = await buildTree(t.db, { stage: 'ready', reservedWorkdayId: other.id });
    const before = await snapshot([free.id, taken.id]);
    const res = await record(workday.id, { trees: [{ treeId: free.id }, { treeId: taken.id }] });
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'conflict', fields: { trees: [`${taken.tag} is reserved for another workday`] } });
    expect(await snapshot([free.id, taken.id])).toEqual(before);
  });

  it.each([
    ['no trees', { trees: [] }],
    ['a bed elevation out of range', { trees: [{ treeId: NO_ID, bedElevationM: 9 }] }],
    ['a malformed date', { plantedOn: '12/03/2026', trees: [{ treeId: NO_ID }] }],
    ['an unknown field', { trees: [{ treeId: NO_ID }], note: 'x' }],
  ])('refuses %s with 400', async (_name, body) => {
    const { workday } = await pastPlanting();
    expect((await record(workday.id, body)).status).toBe(400);
  });

  it('refuses unknown trees, future dates, and workdays that are not planting or not held', async () => {
    const { workday } = await pastPlanting();
    const tree = await buildTree(t.db, { stage: 'ready' });
    expect(ErrorBody.parse((await record(workday.id, { trees: [{ treeId: NO_ID }] })).body).error.fields?.trees).toEqual([`unknown tree ids: ${NO_ID}`]);
    const future = new Date(Date.now() + 3 * DAY).toISOString().slice(0, 10);
    expect((await record(workday.id, { plantedOn: future, trees: [{ treeId: tree.id }] })).status).toBe(400);
    const nursery = (await pastPlanting({ kind: 'nursery' })).workday;
    expect((await record(nursery.id, { trees: [{ treeId: tree.id }] })).status).toBe(409);
    const cancelled = (await pastPlanting({ status: 'cancelled' })).workday;
    expect((await record(cancelled.id, { trees: [{ treeId: tree.id }] })).status).toBe(409);
    expect((await record(NO_ID, { trees: [{ treeId: tree.id }] })).status).toBe(404);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).stage).toBe('ready');
  });
});

describe('DELETE /api/workdays/:id/plantings/:treeId', () => {
  const undo = (workdayId: string, treeId: string) => staff.agent.delete(`/api/workdays/${workdayId}/plantings/${treeId}`).set('X-CSRF-Token', staff.token);

  it('puts a mistaken record back to the stage and tank the tree left, with a history entry', async () => {
    const { workday } = await pastPlanting();
    const tank = await buildTank(t.db);
    const tree = await buildTree(t.db, { stage: 'brining', reservedWorkdayId: workday.id, tankId: tank.id });
    await record(workday.id, { trees: [{ treeId: tree.id }] }).expect(200);
    const res = await undo(workday.id, tree.id);
    expect(res.status).toBe(204);
    expect(await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).toMatchObject({ stage: 'brining', tankId: tank.id, siteId: null, plantedOn: null, plantedWorkdayId: null, reservedWorkdayId: workday.id });
    const last = await t.db.getRepository(TreeEvent).findOne({ where: { treeId: tree.id, kind: 'stage' }, order: { createdAt: 'DESC' } });
    expect(last).toMatchObject({ fromStage: 'planted', toStage: 'brining', byId: staff.user.id });
    expect((await undo(workday.id, tree.id)).status).toBe(404);
  });

  it('refuses once the tree has a monitoring check', async () => {
    const { site, workday, day } = await pastPlanting();
    const tree = await buildTree(t.db, { stage: 'ready' });
    await record(workday.id, { trees: [{ treeId: tree.id }] }).expect(200);
    const listed = async () => (await staff.agent.get(`/api/workdays/${workday.id}/plantings`).expect(200)).body.trees;
    expect(await listed()).toEqual([expect.objectContaining({ id: tree.id, hasChecks: false })]);
    const visit = await t.db.getRepository(MonitoringVisit).save({ siteId: site.id, visitedOn: day });
    // "Missing" keeps the stage planted, so only hasChecks tells the screen the undo would be refused.
    await t.db.getRepository(TreeCheck).insert({ visitId: visit.id, treeId: tree.id, condition: 'missing' });
    expect(await listed()).toEqual([expect.objectContaining({ id: tree.id, stage: 'planted', hasChecks: true })]);
    expect((await undo(workday.id, tree.id)).status).toBe(409);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).stage).toBe('planted');
  });
});
