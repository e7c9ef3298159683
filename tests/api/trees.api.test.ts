import QRCode from 'qrcode';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { buildTank } from '../factories/tank.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
let volunteer: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp();
  staff = await authAgentFor(t, 'coordinator');
  volunteer = await authAgentFor(t, 'volunteer');
});
afterAll(() => t.close());

const NO_ID = '00000000-0000-4000-8000-000000000000';

async function newBatch(count: number) {
  const res = await staff.agent.post('/api/batches').set('X-CSRF-Token', staff.token).send({ collectedOn: '2026-09-01', place: 'Test wrack line', count });
  return res.body as { batch: { id: string; code: string }; trees: { id: string; tag: string }[] };
}

describe('GET /api/trees', () => {
  it('filters by stage, tank and tag, pages in tag order and counts the total (volunteers may read)', async () => {
    const tank = await buildTank(t.db);
    const trees = await Promise.all([1, 2, 3].map((i) => buildTree(t.db, { tag: `Q-${tank.id.slice(0, 6)}-${i}`, tankId: tank.id, stage: i === 3 ? 'brining' : 'potted', heightCm: 20 + i })));
    const page = await volunteer.agent.get(`/api/trees?tankId=${tank.id}&stage=potted,brining&pageSize=2&page=2`);
    expect(page.status).toBe(200);
    expect(page.body.total).toBe(3);
    expect(page.body.trees).toEqual([expect.objectContaining({ id: trees[2]!.id, tag: trees[2]!.tag, stage: 'brining', tank: { id: tank.id, name: tank.name }, heightCm: 23, thumbUrl: null, batchCode: null })]);
    const byStage = await volunteer.agent.get(`/api/trees?tankId=${tank.id}&stage=brining`);
    expect(byStage.body.total).toBe(1);
    const byTag = await volunteer.agent.get(`/api/trees?q=${encodeURIComponent(`${tank.id.slice(0, 6)}-2`)}`);
    expect(byTag.body.trees.map((x: { id: string }) => x.id)).toEqual([trees[1]!.id]);
  });

  it('rejects an unknown stage with 400 on `stage`', async () => {
    const res = await volunteer.agent.get('/api/trees?stage=seedling');
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('stage.0');
  });

  it('is for signed-in people only', async () => {
    const { default: request } = await import('supertest');
    expect((await request(t.app).get('/api/trees')).status).toBe(401);
  });
});

describe('PATCH /api/trees/:id', () => {
  it('records pot details and health, and notes the change in the history', async () => {
    const tree = await buildTree(t.db);
    const res = await staff.agent.patch(`/api/trees/${tree.id}`).set('X-CSRF-Token', staff.token).send({ potHeightCm: 30, potMassKg: 18.5, healthy: false });
    expect(res.status).toBe(200);
    expect(res.body.tree).toMatchObject({ potHeightCm: 30, potMassKg: 18.5, healthy: false });
    const detail = (await volunteer.agent.get(`/api/trees/${tree.id}`)).body;
    expect(detail.history[0]).toMatchObject({ kind: 'note', note: 'pot height 30 cm; pot mass 18.5 kg; marked unhealthy', healthy: false });
  });

  it('rejects a photo that was never uploaded and changes nothing', async () => {
    const tree = await buildTree(t.db, { potHeightCm: 25 });
    const res = await staff.agent.patch(`/api/trees/${tree.id}`).set('X-CSRF-Token', staff.token).send({ potHeightCm: 40, photoId: NO_ID });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('photoId');
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).potHeightCm).toBe(25);
  });

  it('answers 404 for an unknown tree and 403 for a volunteer', async () => {
    expect((await staff.agent.patch(`/api/trees/${NO_ID}`).set('X-CSRF-Token', staff.token).send({ healthy: true })).status).toBe(404);
    const tree = await buildTree(t.db);
    const res = await volunteer.agent.patch(`/api/trees/${tree.id}`).set('X-CSRF-Token', volunteer.token).send({ healthy: false });
    expect(res.status).toBe(403);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).healthy).toBe(true);
  });
});

describe('POST /api/trees/:id/measurements', () => {
  it('updates the latest values and adds to the history and the growth series', async () => {
    const tree = await buildTree(t.db);
    const first = await staff.agent.post(`/api/trees/${tree.id}/measurements`).set('X-CSRF-Token', staff.token).send({ heightCm: 22, leafCount: 4, at: '2026-08-01T14:00:00Z' });
    expect(first.status).toBe(201);
    expect(first.body.tree).toMatchObject({ heightCm: 22, leafCount: 4 });
    await staff.agent.post(`/api/trees/${tree.id}/measurements`).set('X-CSRF-Token', staff.token).send({ heightCm: 27, healthy: true, note: 'new leaf pair' }).expect(201);
    // Back-filled from a paper sheet: history gains it, the latest values stay.
    const old = await staff.agent.post(`/api/trees/${tree.id}/measurements`).set('X-CSRF-Token', staff.token).send({ heightCm: 18, at: '2026-07-01T14:00:00Z' });
    expect(old.body.tree).toMatchObject({ heightCm: 27, leafCount: 4 });
    const detail = (await volunteer.agent.get(`/api/trees/${tree.id}`)).body;
    expect(detail.measurements.map((m: { heightCm: number }) => m.heightCm)).toEqual([18, 22, 27]);
    expect(detail.history[0]).toMatchObject({ kind: 'measurement', heightCm: 27, note: 'new leaf pair', by: { id: staff.user.id } });
  });

  it.each([
    [{}, '_'],
    [{ heightCm: -1 }, 'heightCm'],
    [{ heightCm: 20, at: '2999-01-01T00:00:00Z' }, 'at'],
  ])('rejects %j with 400 and records nothing', async (body, field) => {
    const tree = await buildTree(t.db, { heightCm: 10 });
    const res = await staff.agent.post(`/api/trees/${tree.id}/measurements`).set('X-CSRF-Token', staff.token).send(body);
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty(field);
    expect((await volunteer.agent.get(`/api/trees/${tree.id}`)).body).toMatchObject({ history: [], tree: { heightCm: 10 } });
  });
});

describe('GET /api/trees/labels', () => {
  it('prints a batch as an HTML label sheet: one QR code to each tree\'s page, its tag and the batch code', async () => {
    const { batch, trees } = await newBatch(2);
    const res = await volunteer.agent.get(`/api/trees/labels?batchId=${batch.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/html/);
    expect(res.text.match(/<svg/g)).toHaveLength(2);
    for (const tree of trees) {
      expect(res.text).toContain(`>${tree.tag}<`);
      const qr = await QRCode.toString(`${t.config.APP_URL.replace(/\/$/, '')}/nursery/trees/${tree.id}`, { type: 'svg', margin: 0, errorCorrectionLevel: 'M' });
      expect(res.text).toContain(qr);
    }
    expect(res.text).toContain(`Batch ${batch.code}`);
    expect(res.text).toContain('@page');
  });

  it('prints listed trees and names unknown ids with 400', async () => {
    const { trees } = await newBatch(2);
    const ok = await volunteer.agent.get(`/api/trees/labels?ids=${trees[1]!.id}`);
    expect(ok.text.match(/<svg/g)).toHaveLength(1);
    const bad = await volunteer.agent.get(`/api/trees/labels?ids=${trees[0]!.id},${NO_ID}`);
    expect(bad.status).toBe(400);
    expect(ErrorBody.parse(bad.body).error.fields?.ids?.[0]).toContain(NO_ID);
  });

  it('needs ids or a batch', async () => {
    expect((await volunteer.agent.get('/api/trees/labels')).status).toBe(400);
  });
});
