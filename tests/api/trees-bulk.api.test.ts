import { In } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
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

const NO_ID = '00000000-0000-4000-8000-000000000000';
const move = (body: object) => staff.agent.post('/api/trees/bulk/move').set('X-CSRF-Token', staff.token).send(body);
const snapshot = async (ids: string[]) => ({
  trees: (await t.db.getRepository(Tree).find({ where: { id: In(ids) }, order: { id: 'ASC' } })).map(({ stage, tankId, updatedAt }) => ({ stage, tankId, updatedAt })),
  events: await t.db.getRepository(TreeEvent).countBy({ treeId: In(ids) }),
});

describe('POST /api/trees/bulk/move', () => {
  it('moves every tree to the stage and tank, one history entry per tree per change', async () => {
    const tank = await buildTank(t.db);
    const a = await buildTree(t.db, { stage: 'tube' });
    const b = await buildTree(t.db, { stage: 'potted', tankId: tank.id });
    const res = await move({ treeIds: [a.id, b.id], stage: 'potted', tankId: tank.id, note: 'Potted on workday' });
    expect(res.status).toBe(200);
    expect(res.body.changed).toBe(1);
    expect(res.body.trees).toEqual(expect.arrayContaining([expect.objectContaining({ id: a.id, stage: 'potted', tank: { id: tank.id, name: tank.name } }), expect.objectContaining({ id: b.id, stage: 'potted' })]));
    const events = await t.db.getRepository(TreeEvent).find({ where: { treeId: In([a.id, b.id]) } });
    // a: stage tube → potted and a move into the tank; b was already potted in that tank.
    expect(events.map((e) => [e.treeId, e.kind, e.fromStage, e.toStage, e.tankId, e.note]).sort()).toEqual([
      [a.id, 'move', null, null, tank.id, 'Potted on workday'],
      [a.id, 'stage', 'tube', 'potted', null, 'Potted on workday'],
    ].sort());
  });

  it('takes trees out of their tank with tankId null', async () => {
    const tank = await buildTank(t.db);
    const a = await buildTree(t.db, { tankId: tank.id });
    expect((await move({ treeIds: [a.id], tankId: null })).status).toBe(200);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: a.id })).tankId).toBeNull();
  });

  it('refuses a backward move for any tree, names its tag, and changes none of them', async () => {
    const tank = await buildTank(t.db);
    const ok = await buildTree(t.db, { stage: 'potted' });
    const back = await buildTree(t.db, { stage: 'ready' });
    const before = await snapshot([ok.id, back.id]);
    const res = await move({ treeIds: [ok.id, back.id], stage: 'brining', tankId: tank.id });
    expect(res.status).toBe(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.fields?.treeIds).toEqual([`${back.tag} is ready; stages only move forward (or to lost)`]);
    expect(await snapshot([ok.id, back.id])).toEqual(before);
  });

  it('names unknown tree ids with 400 and changes nothing', async () => {
    const a = await buildTree(t.db, { stage: 'tube' });
    const before = await snapshot([a.id]);
    const res = await move({ treeIds: [a.id, NO_ID], stage: 'potted' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields?.treeIds?.[0]).toContain(NO_ID);
    expect(await snapshot([a.id])).toEqual(before);
  });

  it('lets any tree be recorded lost, takes it out of its tank and releases its reservation', async () => {
    const tank = await buildTank(t.db);
    const workday = await buildWorkday(t.db);
    const a = await buildTree(t.db, { stage: 'ready', tankId: tank.id, reservedWorkdayId: workday.id });
    expect((await move({ treeIds: [a.id], stage: 'lost', note: 'Crab damage' })).status).toBe(200);
    expect(await t.db.getRepository(Tree).findOneByOrFail({ id: a.id })).toMatchObject({ stage: 'lost', tankId: null, reservedWorkdayId: null });
    expect((await move({ treeIds: [a.id], stage: 'ready' })).status).toBe(400);
  });

  it('records planting on the reserved workday\'s site', async () => {
    const workday = await buildWorkday(t.db);
    const a = await buildTree(t.db, { stage: 'ready', reservedWorkdayId: workday.id });
    expect((await move({ treeIds: [a.id], stage: 'planted' })).status).toBe(200);
    expect(await t.db.getRepository(Tree).findOneByOrFail({ id: a.id })).toMatchObject({ stage: 'planted', siteId: workday.siteId, plantedOn: expect.stringMatching(/^\d{4}-\d{2}-\d{2}$/) });
  });

  it.each([
    [{ treeIds: [] }, 'treeIds'],
    [{ treeIds: [NO_ID] }, 'stage'],
    [{ treeIds: [NO_ID, NO_ID], stage: 'tube' }, 'treeIds'],
    [{ treeIds: [NO_ID], stage: 'seedling' }, 'stage'],
  ])('rejects %j with 400', async (body, field) => {
    const res = await move(body);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
  });

  it('refuses an unknown tank', async () => {
    const a = await buildTree(t.db);
    const res = await move({ treeIds: [a.id], tankId: NO_ID });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('tankId');
  });
});

describe('POST /api/tanks/:id/measurement-round', () => {
  const round = (tankId: string, body: object) => staff.agent.post(`/api/tanks/${tankId}/measurement-round`).set('X-CSRF-Token', staff.token).send(body);

  it('records one measurement per tree of the tank', async () => {
    const tank = await buildTank(t.db);
    const [a, b] = await Promise.all([buildTree(t.db, { tankId: tank.id }), buildTree(t.db, { tankId: tank.id })]);
    const res = await round(tank.id, { measurements: [{ treeId: a!.id, heightCm: 31, leafCount: 6 }, { treeId: b!.id, healthy: false, note: 'yellow leaves' }] });
    expect(res.status).toBe(201);
    expect(res.body.recorded).toBe(2);
    expect(await t.db.getRepository(Tree).findOneByOrFail({ id: a!.id })).toMatchObject({ heightCm: 31, leafCount: 6 });
    expect(await t.db.getRepository(Tree).findOneByOrFail({ id: b!.id })).toMatchObject({ healthy: false });
    expect(await t.db.getRepository(TreeEvent).countBy({ treeId: In([a!.id, b!.id]), kind: 'measurement' })).toBe(2);
  });

  it('refuses the whole round when a tree stands elsewhere, naming it', async () => {
    const tank = await buildTank(t.db, { name: `Round ${Math.random()}` });
    const here = await buildTree(t.db, { tankId: tank.id });
    const there = await buildTree(t.db);
    const before = await snapshot([here.id, there.id]);
    const res = await round(tank.id, { measurements: [{ treeId: here.id, heightCm: 30 }, { treeId: there.id, heightCm: 30 }] });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields?.measurements).toEqual([`${there.tag} is not in ${tank.name}`]);
    expect(await snapshot([here.id, there.id])).toEqual(before);
  });

  it('answers 404 for an unknown tank', async () => {
    const a = await buildTree(t.db);
    expect((await round(NO_ID, { measurements: [{ treeId: a.id, heightCm: 3 }] })).status).toBe(404);
  });
});
