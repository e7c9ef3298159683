import { Router } from 'express';
import type { DataSource } from 'typeorm';

/** `GET /api/health`: 200 only after a real database round trip. */
export function healthRouter(deps: { db: DataSource }): Router {
  const r = Router();
  r.get('/', async (_req, res) => {
    try {
      await deps.db.query('SELECT 1');
      res.json({ status: 'ok', db: 'ok' });
    } catch {
      // Carries the shared error shape too, so clients handle it like any other failure.
      res.status(503).json({ status: 'degraded', db: 'down', error: { code: 'service_unavailable', message: 'The database does not answer' } });
    }
  });
  return r;
}
