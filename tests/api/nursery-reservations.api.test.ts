import { In } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
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
const reserve = (workdayId: string, treeIds: string[]) => staff.agent.post(`/api/workdays/${workdayId}/reserved-trees`).set('X-CSRF-Token', staff.token).send({ treeIds });
const reservedIds = async (ids: string[]) => Object.fromEntries((await t.db.getRepository(Tree).find({ where: { id: In(ids) } })).map((x) => [x.id, x.reservedWorkdayId]));

describe('POST /api/workdays/:id/reserved-trees', () => {
  it('reserves ready and brining trees, notes it in their history, and lists them for the workday', async () => {
    const workday = await buildWorkday(t.db);
    const a = await buildTree(t.db, { stage: 'ready' });
    const b = await buildTree(t.db, { stage: 'brining' });
    const res = await reserve(workday.id, [a.id, b.id]);
    expect(res.status).toBe(200);
    expect(res.body.trees.map((x: { id: string }) => x.id).sort()).toEqual([a.id, b.id].sort());
    expect(await t.db.getRepository(TreeEvent).countBy({ treeId: In([a.id, b.id]), kind: 'reserve' })).toBe(2);
    const volunteer = await authAgentFor(t, 'volunteer');
    const list = await volunteer.agent.get(`/api/workdays/${workday.id}/reserved-trees`);
    expect(list.status).toBe(200);
    expect(list.body.trees).toHaveLength(2);
    expect(list.body.trees[0]).toMatchObject({ reservedWorkdayId: workday.id });
    expect((await reserve(workday.id, [a.id])).status).toBe(200); // again: no change, no error
  });

  it('reserves none when one tree is not ready or brining, naming it', async () => {
    const workday = await buildWorkday(t.db);
    const ok = await buildTree(t.db, { stage: 'ready' });
    const young = await buildTree(t.db, { stage: 'potted' });
    const before = await reservedIds([ok.id, young.id]);
    const res = await reserve(workday.id, [ok.id, young.id]);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields?.treeIds).toEqual([`${young.tag} is potted; only brining or ready trees can be reserved`]);
    expect(await reservedIds([ok.id, young.id])).toEqual(before);
  });

  it('answers 409 and reserves none when a tree is promised to another workday', async () => {
    const [first, second] = await Promise.all([buildWorkday(t.db), buildWorkday(t.db)]);
    const taken = await buildTree(t.db, { stage: 'ready', reservedWorkdayId: first!.id });
    const free = await buildTree(t.db, { stage: 'ready' });
    const res = await reserve(second!.id, [free.id, taken.id]);
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'conflict', fields: { treeIds: [`${taken.tag} is reserved for another workday`] } });
    expect(await reservedIds([taken.id, free.id])).toEqual({ [taken.id]: first!.id, [free.id]: null });
  });

  it('answers 404 for an unknown workday and 409 for a cancelled one', async () => {
    const tree = await buildTree(t.db, { stage: 'ready' });
    expect((await reserve(NO_ID, [tree.id])).status).toBe(404);
    const cancelled = await buildWorkday(t.db, { status: 'cancelled' });
    expect((await reserve(cancelled.id, [tree.id])).status).toBe(409);
  });
});

describe('DELETE /api/workdays/:id/reserved-trees/:treeId', () => {
  it('releases one tree', async () => {
    const workday = await buildWorkday(t.db);
    const tree = await buildTree(t.db, { stage: 'ready', reservedWorkdayId: workday.id });
    const res = await staff.agent.delete(`/api/workdays/${workday.id}/reserved-trees/${tree.id}`).set('X-CSRF-Token', staff.token);
    expect(res.status).toBe(204);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).reservedWorkdayId).toBeNull();
    const again = await staff.agent.delete(`/api/workdays/${workday.id}/reserved-trees/${tree.id}`).set('X-CSRF-Token', staff.token);
    expect(again.status).toBe(404);
  });
});
