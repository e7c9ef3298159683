import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { CollectionBatch } from '../../server/db/entities/collection-batch.entity.js';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { buildTank } from '../factories/tank.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp();
  staff = await authAgentFor(t, 'coordinator');
});
afterAll(() => t.close());

const batchInfo = (place = 'Wrack line, north shore') => ({ collectedOn: '2026-09-14', place, latitude: 27.99, longitude: -82.69, collector: 'Test collector' });
const tagNumber = (tag: string) => Number(/^T-(\d+)$/.exec(tag)?.[1]);

describe('POST /api/batches', () => {
  it('creates the batch and `count` collected trees with consecutive fresh tags', async () => {
    const res = await staff.agent.post('/api/batches').set('X-CSRF-Token', staff.token).send({ ...batchInfo(), count: 3, notes: 'Ripe, floating' });
    expect(res.status).toBe(201);
    expect(res.body.batch).toMatchObject({ ...batchInfo(), count: 3, notes: 'Ripe, floating', code: expect.stringMatching(/^B-\d{4,}$/) });
    const tags: string[] = res.body.trees.map((x: { tag: string }) => x.tag);
    expect(tags).toHaveLength(3);
    expect(tags.every((tag) => /^T-\d{4,}$/.test(tag))).toBe(true);
    expect(tags.map(tagNumber)).toEqual([tagNumber(tags[0]!), tagNumber(tags[0]!) + 1, tagNumber(tags[0]!) + 2]);
    const ledger = await staff.agent.get(`/api/trees?batchId=${res.body.batch.id}`);
    expect(ledger.body).toMatchObject({ total: 3, trees: tags.map((tag) => ({ tag, stage: 'collected', batchCode: res.body.batch.code, tank: null })) });
  });

  it('starts each tree\'s history with its entry into the ledger', async () => {
    const res = await staff.agent.post('/api/batches').set('X-CSRF-Token', staff.token).send({ ...batchInfo(), count: 1 });
    const detail = await staff.agent.get(`/api/trees/${res.body.trees[0].id}`);
    expect(detail.body.history).toEqual([expect.objectContaining({ kind: 'stage', fromStage: null, toStage: 'collected', by: { id: staff.user.id, name: staff.user.name } })]);
  });

  it('never hands out the same tag twice when batches are created at the same time', async () => {
    const results = await Promise.all(Array.from({ length: 5 }, (_, i) => staff.agent.post('/api/batches').set('X-CSRF-Token', staff.token).send({ ...batchInfo(`Parallel ${i}`), count: 4 })));
    expect(results.map((r) => r.status)).toEqual([201, 201, 201, 201, 201]);
    const tags = results.flatMap((r) => r.body.trees.map((x: { tag: string }) => x.tag));
    expect(new Set(tags).size).toBe(20);
    expect(new Set(results.map((r) => r.body.batch.code)).size).toBe(5);
  });

  it.each([
    [{ count: 0 }, 'count'],
    [{ count: 501 }, 'count'],
    [{ place: '' }, 'place'],
    [{ collectedOn: '14/09/2026' }, 'collectedOn'],
    [{ latitude: 27.9, longitude: undefined }, 'longitude'],
    [{ collectedOn: '2999-01-01' }, 'collectedOn'],
  ])('rejects %j with 400 on that field and stores nothing', async (override, field) => {
    const place = `Rejected ${field} ${Math.random()}`;
    const res = await staff.agent.post('/api/batches').set('X-CSRF-Token', staff.token).send({ ...batchInfo(place), count: 2, ...override });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect(await t.db.getRepository(CollectionBatch).countBy({ place })).toBe(0);
  });

  it('refuses volunteers', async () => {
    const v = await authAgentFor(t, 'volunteer');
    const res = await v.agent.post('/api/batches').set('X-CSRF-Token', v.token).send({ ...batchInfo(), count: 1 });
    expect(res.status).toBe(403);
    expect(ErrorBody.parse(res.body).error.code).toBe('forbidden');
  });
});

describe('GET /api/batches', () => {
  it('lists batches and shows one with its trees to a volunteer', async () => {
    const created = (await staff.agent.post('/api/batches').set('X-CSRF-Token', staff.token).send({ ...batchInfo(), count: 2 })).body;
    const v = await authAgentFor(t, 'volunteer');
    const list = await v.agent.get('/api/batches');
    expect(list.status).toBe(200);
    expect(list.body.batches.map((b: { id: string }) => b.id)).toContain(created.batch.id);
    const one = await v.agent.get(`/api/batches/${created.batch.id}`);
    expect(one.body).toMatchObject({ batch: { id: created.batch.id, code: created.batch.code }, trees: created.trees.map((x: object) => ({ ...x, stage: 'collected' })) });
  });

  it('answers 404 for an unknown batch', async () => {
    const res = await staff.agent.get('/api/batches/00000000-0000-4000-8000-000000000000');
    expect(res.status).toBe(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
  });
});

describe('POST /api/batches/import', () => {
  it('previews every row with its values and errors and stores nothing', async () => {
    const tank = await buildTank(t.db);
    const place = `Preview ${Math.random()}`;
    const csv = `stage,tank,height_cm,pot_height_cm,pot_mass_kg,note\npotted,${tank.name.toUpperCase()},31.5,30,18.5,"strong, 4 leaves"\nplanted,No such tank,tall,,,\n`;
    const res = await staff.agent.post('/api/batches/import').set('X-CSRF-Token', staff.token).send({ batch: batchInfo(place), csv, commit: false });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      valid: false,
      rows: [
        { line: 2, ok: true, errors: [], values: { stage: 'potted', tank: tank.name.toUpperCase(), tankId: tank.id, heightCm: 31.5, potHeightCm: 30, potMassKg: 18.5, note: 'strong, 4 leaves' } },
        { line: 3, ok: false, errors: [expect.stringContaining('stage'), expect.stringContaining('tank'), expect.stringContaining('height_cm')], values: expect.objectContaining({ stage: 'planted', tankId: null }) },
      ],
    });
    expect(await t.db.getRepository(CollectionBatch).countBy({ place })).toBe(0);
  });

  it('with commit and a bad row answers 400 naming the row, and stores no batch and no tree', async () => {
    const place = `Bad import ${Math.random()}`;
    const before = await t.db.getRepository(Tree).count();
    const csv = 'stage,height_cm\ntube,12\ntube,-3\ntube,14\n';
    const res = await staff.agent.post('/api/batches/import').set('X-CSRF-Token', staff.token).send({ batch: batchInfo(place), csv, commit: true });
    expect(res.status).toBe(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.fields).toEqual({ 'rows.3': [expect.stringContaining('height_cm')] });
    expect(await t.db.getRepository(CollectionBatch).countBy({ place })).toBe(0);
    expect(await t.db.getRepository(Tree).count()).toBe(before);
  });

  it('with commit and valid rows creates the batch and its trees in tanks, with heights in their history', async () => {
    const tank = await buildTank(t.db);
    const csv = `tank,stage,height_cm,note\r\n${tank.name},tube,12,\r\n\r\n,collected,,second\r\n`;
    const res = await staff.agent.post('/api/batches/import').set('X-CSRF-Token', staff.token).send({ batch: batchInfo(), csv, commit: true });
    expect(res.status).toBe(201);
    expect(res.body.batch.count).toBe(2);
    const [first, second] = res.body.trees;
    const a = (await staff.agent.get(`/api/trees/${first.id}`)).body;
    expect(a.tree).toMatchObject({ stage: 'tube', tank: { id: tank.id, name: tank.name }, heightCm: 12 });
    expect(a.measurements).toEqual([expect.objectContaining({ heightCm: 12 })]);
    expect((await staff.agent.get(`/api/trees/${second.id}`)).body.tree).toMatchObject({ stage: 'collected', tank: null, heightCm: null });
    expect(await t.db.getRepository(TreeEvent).countBy({ treeId: second.id, note: 'second' })).toBe(1);
  });

  it('requires the header line', async () => {
    const res = await staff.agent.post('/api/batches/import').set('X-CSRF-Token', staff.token).send({ batch: batchInfo(), csv: 'potted,Tank A,30\n', commit: false });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('csv');
  });
});
