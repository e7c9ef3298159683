import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import type { Site } from '../../server/db/entities/site.entity.js';
import { buildSite } from '../factories/site.factory.js';
import { authAgentFor, createTestApp, type Agent, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let agent: Agent;
let token: string;
let site: Site;

beforeAll(async () => {
  t = await createTestApp();
  ({ agent, token } = await authAgentFor(t, 'coordinator'));
  site = await buildSite(t.db);
});
afterAll(() => t.close());

interface Point { time: string; height: number }
interface Window { start: string; end: string; lowestLevel: number; score: number; sunrise: string | null; sunset: string | null; cautions: unknown[] }

describe('GET /api/sites/:id/tide', () => {
  it('returns a week of levels, extremes, daylight and windows that meet both depth limits in daylight', async () => {
    const res = await agent.get(`/api/sites/${site.id}/tide`).query({ from: '2026-12-07T05:00:00Z', to: '2026-12-14T05:00:00Z', units: 'm' });
    expect(res.status).toBe(200);
    const { levels, extremes, daylight, windows, lines } = res.body as { levels: Point[]; extremes: unknown[]; daylight: unknown[]; windows: Window[]; lines: Record<string, number> };
    expect(levels.length).toBe(7 * 24 * 6 + 1);
    expect(extremes.length).toBeGreaterThan(14);
    expect(daylight.length).toBeGreaterThanOrEqual(7);
    expect(lines).toEqual({ bed: 0.2, route: -0.15, workableBelow: 0.65, floatableAbove: 0.08 });
    expect(res.body.station).toMatchObject({ id: 'noaa/8726738', attribution: expect.any(String) });
    for (const w of windows) {
      const inside = levels.filter((p) => p.time >= w.start && p.time <= w.end);
      for (const p of inside) {
        expect(p.height).toBeLessThanOrEqual(lines.workableBelow! + 0.005);
        expect(p.height).toBeGreaterThanOrEqual(lines.floatableAbove! - 0.005);
      }
      expect(w.start >= (w.sunrise ?? '')).toBe(true);
      expect(w.end <= (w.sunset ?? '9')).toBe(true);
      expect(Date.parse(w.end) - Date.parse(w.start)).toBeGreaterThanOrEqual(120 * 60_000);
    }
  });

  it('caps the board at 14 days', async () => {
    const res = await agent.get(`/api/sites/${site.id}/tide`).query({ from: '2026-12-01', to: '2026-12-20' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('to');
  });
});

describe('GET /api/sites/:id/windows', () => {
  it('ranks two months of windows by score, best first', async () => {
    const res = await agent.get(`/api/sites/${site.id}/windows`).query({ from: '2027-01-01', to: '2027-03-01', units: 'ft' });
    expect(res.status).toBe(200);
    const scores = (res.body.windows as Window[]).map((w) => w.score);
    expect(scores.length).toBeGreaterThan(5);
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
    expect(res.body.units).toBe('ft');
  });

  it('lists them in time order on request', async () => {
    const res = await agent.get(`/api/sites/${site.id}/windows`).query({ from: '2027-01-01', to: '2027-02-01', sort: 'time' });
    const starts = (res.body.windows as Window[]).map((w) => w.start);
    expect(starts).toEqual([...starts].sort());
  });
});

describe('GET /api/windows', () => {
  it('gives every site its windows and each local date its lowest water', async () => {
    const res = await agent.get('/api/windows').query({ from: '2027-01-01T05:00:00Z', to: '2027-02-01T05:00:00Z' });
    expect(res.status).toBe(200);
    expect(res.body.sites.map((s: { id: string }) => s.id)).toContain(site.id);
    const lowest = (res.body.lowest as { siteId: string; date: string }[]).filter((l) => l.siteId === site.id);
    expect(new Set(lowest.map((l) => l.date)).size).toBe(lowest.length);
    expect(lowest.length).toBeGreaterThanOrEqual(30);
  });

  it('refuses more than two months at once', async () => {
    expect((await agent.get('/api/windows').query({ from: '2027-01-01', to: '2027-06-01' })).status).toBe(400);
  });
});

describe('POST /api/workdays', () => {
  it('opens a draft workday from a window', async () => {
    const win = (await agent.get(`/api/sites/${site.id}/windows`).query({ from: '2027-01-01', to: '2027-02-01' })).body.windows[0] as Window;
    const res = await agent.post('/api/workdays').set('X-CSRF-Token', token).send({ siteId: site.id, startsAt: win.start, endsAt: win.end });
    expect(res.status).toBe(201);
    expect(res.body.workday).toMatchObject({ siteId: site.id, startsAt: win.start, endsAt: win.end, status: 'draft', kind: 'planting', title: `Planting at ${site.name}` });
    const drafts = (await agent.get('/api/workdays').query({ status: 'draft', siteId: site.id })).body.workdays;
    expect(drafts.map((w: { id: string }) => w.id)).toContain(res.body.workday.id);
  });

  it('rejects an end before the start and an unknown site', async () => {
    const bad = await agent.post('/api/workdays').set('X-CSRF-Token', token).send({ siteId: site.id, startsAt: '2027-01-02T15:00:00Z', endsAt: '2027-01-02T13:00:00Z' });
    expect(bad.status).toBe(400);
    expect(ErrorBody.parse(bad.body).error.fields).toHaveProperty('endsAt');
    const unknown = await agent.post('/api/workdays').set('X-CSRF-Token', token).send({ siteId: '00000000-0000-4000-8000-000000000000', startsAt: '2027-01-02T13:00:00Z', endsAt: '2027-01-02T15:00:00Z' });
    expect(unknown.status).toBe(404);
  });
});
