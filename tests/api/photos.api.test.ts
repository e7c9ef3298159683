import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { Photo } from '../../server/db/entities/photo.entity.js';
import { buildTree } from '../factories/tree.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
let tinyPng: Buffer;
beforeAll(async () => {
  t = await createTestApp();
  staff = await authAgentFor(t, 'coordinator');
  tinyPng = await sharp({ create: { width: 640, height: 400, channels: 3, background: { r: 31, g: 94, b: 70 } } }).png().toBuffer();
});
afterAll(() => t.close());

const upload = (data: Buffer, filename: string, contentType?: string) =>
  staff.agent.post('/api/photos').set('X-CSRF-Token', staff.token).attach('photo', data, { filename, ...(contentType && { contentType }) });

describe('POST /api/photos', () => {
  it('stores a real PNG under a generated name with a 320 px JPEG thumbnail', async () => {
    const res = await upload(tinyPng, 'seedling.png');
    expect(res.status).toBe(201);
    const id = res.body.photo.id;
    expect(res.body.photo).toEqual({ id, url: `/api/photos/${id}`, thumbUrl: `/api/photos/${id}/thumb` });
    const row = await t.db.getRepository(Photo).findOneByOrFail({ id });
    expect(row).toMatchObject({ mimeType: 'image/png', sizeBytes: tinyPng.length, uploadedById: staff.user.id });
    expect(row.storedName).not.toContain('seedling');
    const volunteer = await authAgentFor(t, 'volunteer');
    const original = await volunteer.agent.get(res.body.photo.url).buffer(true);
    expect(original.status).toBe(200);
    expect(original.headers['content-type']).toBe('image/png');
    expect(original.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(original.body, tinyPng)).toBe(0);
    const thumb = await volunteer.agent.get(res.body.photo.thumbUrl).buffer(true);
    expect(thumb.headers['content-type']).toBe('image/jpeg');
    expect(await sharp(thumb.body).metadata()).toMatchObject({ format: 'jpeg', width: 320, height: 200 });
  });

  it('judges by content: a text file named .jpg and sent as image/jpeg is refused', async () => {
    const before = await t.db.getRepository(Photo).count();
    const res = await upload(Buffer.from('not really a photo\n'), 'x.jpg', 'image/jpeg');
    expect(res.status).toBe(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.code).toBe('validation_failed');
    expect(body.error.fields).toHaveProperty('photo');
    expect(await t.db.getRepository(Photo).count()).toBe(before);
  });

  it('refuses a file over 8 MB with 413 in the shared error shape', async () => {
    const res = await upload(Buffer.concat([tinyPng, Buffer.alloc(8 * 1024 * 1024)]), 'huge.png');
    expect(res.status).toBe(413);
    expect(ErrorBody.parse(res.body).error.code).toBe('payload_too_large');
  });

  it('asks for a file when none is sent', async () => {
    const res = await staff.agent.post('/api/photos').set('X-CSRF-Token', staff.token).field('note', 'no file');
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('photo');
  });

  it('is CSRF-protected and closed to volunteers', async () => {
    const noToken = await staff.agent.post('/api/photos').attach('photo', tinyPng, 'a.png');
    expect(noToken.status).toBe(403);
    expect(ErrorBody.parse(noToken.body).error.code).toBe('csrf_failed');
    const volunteer = await authAgentFor(t, 'volunteer');
    const res = await volunteer.agent.post('/api/photos').set('X-CSRF-Token', volunteer.token).attach('photo', tinyPng, 'a.png');
    expect(res.status).toBe(403);
  });
});

describe('GET /api/photos/:id', () => {
  it('is for signed-in people and answers 404 for an unknown photo', async () => {
    const created = (await upload(tinyPng, 'a.png')).body.photo;
    expect((await request(t.app).get(created.url)).status).toBe(401);
    expect((await staff.agent.get('/api/photos/00000000-0000-4000-8000-000000000000')).status).toBe(404);
  });

  it('shows as the tree\'s thumbnail once set on the tree', async () => {
    const photo = (await upload(tinyPng, 'tree.png')).body.photo;
    const tree = await buildTree(t.db);
    await staff.agent.post(`/api/trees/${tree.id}/measurements`).set('X-CSRF-Token', staff.token).send({ heightCm: 20, photoId: photo.id }).expect(201);
    const detail = (await staff.agent.get(`/api/trees/${tree.id}`)).body;
    expect(detail.tree).toMatchObject({ photoId: photo.id, thumbUrl: photo.thumbUrl, photoUrl: photo.url });
    expect(detail.history[0]).toMatchObject({ photoUrl: photo.url });
  });
});
