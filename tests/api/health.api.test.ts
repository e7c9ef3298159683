import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('GET /api/health', () => {
  it('answers ok after a database round trip', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'ok' });
  });

  it('answers 503 with db down when the database is gone', async () => {
    const broken = await createTestApp();
    await broken.db.destroy();
    const res = await request(broken.app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ db: 'down' });
    expect(ErrorBody.safeParse(res.body).success).toBe(true);
    await broken.db.initialize();
    await broken.close();
  });
});

describe('errors and headers', () => {
  it('answers an unknown API route with 404 in the shared error shape', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(ErrorBody.parse(res.body).error.code).toBe('not_found');
  });

  it('answers malformed JSON with 400 validation_failed, not a 500', async () => {
    const res = await request(t.app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.code).toBe('validation_failed');
    expect(JSON.stringify(res.body)).not.toContain('at ');
  });

  it('sets helmet headers and a request id', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-request-id']).toMatch(/^[\w-]+$/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('echoes a caller-supplied request id', async () => {
    const res = await request(t.app).get('/api/health').set('X-Request-Id', 'trace-123');
    expect(res.headers['x-request-id']).toBe('trace-123');
  });
});
