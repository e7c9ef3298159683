/**
 * Every API route × signed-out / volunteer / coordinator / admin. Add a row with each new route:
 * the expected status is what the role gets for a harmless request (401 signed out, 403 wrong role).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/user.schema.js';
import { authAgentFor, createTestApp, csrfAgent, type Agent, type TestApp } from '../setup/test-app.js';

type Who = 'anon' | Role;
interface RouteCase {
  method: 'get' | 'post' | 'patch' | 'put' | 'delete';
  path: string;
  body?: object;
  expect: Record<Who, number>;
}

const ALL_OK = { anon: 200, volunteer: 200, coordinator: 200, admin: 200 };
const SIGNED_IN = { anon: 401, volunteer: 200, coordinator: 200, admin: 200 };
const STAFF = { anon: 401, volunteer: 403, coordinator: 200, admin: 200 };
const ADMIN = { anon: 401, volunteer: 403, coordinator: 403, admin: 200 };
const ALL_404 = { anon: 404, volunteer: 404, coordinator: 404, admin: 404 };
const SIGNED_IN_404 = { anon: 401, volunteer: 404, coordinator: 404, admin: 404 };
const STAFF_404 = { anon: 401, volunteer: 403, coordinator: 404, admin: 404 };
const NOBODY_USER = '00000000-0000-4000-8000-000000000000';
const NO_ID = NOBODY_USER;
const SH = encodeURIComponent('noaa/8726738');

const routes: RouteCase[] = [
  { method: 'get', path: '/api/health', expect: ALL_OK },
  { method: 'get', path: '/api/auth/csrf', expect: ALL_OK },
  { method: 'get', path: '/api/auth/me', expect: SIGNED_IN },
  { method: 'post', path: '/api/auth/verify-email/resend', expect: { ...SIGNED_IN, volunteer: 202, coordinator: 202, admin: 202 } },
  { method: 'post', path: '/api/auth/password-reset/request', body: { email: 'nobody@test.ebbroot.test' }, expect: { anon: 202, volunteer: 202, coordinator: 202, admin: 202 } },
  { method: 'get', path: '/api/organisation', expect: ALL_OK },
  { method: 'get', path: '/api/organisation/settings', expect: ADMIN },
  { method: 'patch', path: '/api/organisation/settings', body: {}, expect: ADMIN },
  { method: 'get', path: '/api/stations?q=Safety', expect: SIGNED_IN },
  { method: 'get', path: `/api/stations/${SH}`, expect: SIGNED_IN },
  { method: 'get', path: `/api/stations/${SH}/extremes?from=2026-01-01&to=2026-01-02`, expect: SIGNED_IN },
  { method: 'get', path: `/api/stations/${SH}/levels?from=2026-01-01&to=2026-01-02&step=60`, expect: SIGNED_IN },
  { method: 'get', path: `/api/stations/${SH}/datums?from=2026-01-01&to=2026-01-15`, expect: SIGNED_IN },
  { method: 'get', path: '/api/sites', expect: SIGNED_IN },
  { method: 'get', path: `/api/sites/${NO_ID}`, expect: { ...SIGNED_IN, volunteer: 404, coordinator: 404, admin: 404 } },
  { method: 'post', path: '/api/sites', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'patch', path: `/api/sites/${NO_ID}`, body: {}, expect: { ...STAFF, coordinator: 404, admin: 404 } },
  { method: 'get', path: `/api/sites/${NO_ID}/tide?from=2026-01-01&to=2026-01-02`, expect: { ...SIGNED_IN, volunteer: 404, coordinator: 404, admin: 404 } },
  { method: 'get', path: `/api/sites/${NO_ID}/windows?from=2026-01-01&to=2026-01-02`, expect: { ...SIGNED_IN, volunteer: 404, coordinator: 404, admin: 404 } },
  { method: 'get', path: '/api/windows?from=2026-01-01&to=2026-01-02', expect: SIGNED_IN },
  { method: 'get', path: '/api/workdays', expect: ALL_OK },
  { method: 'get', path: `/api/workdays/${NO_ID}`, expect: ALL_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/tide`, expect: ALL_404 },
  { method: 'post', path: '/api/workdays', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'patch', path: `/api/workdays/${NO_ID}`, body: {}, expect: STAFF_404 },
  { method: 'post', path: `/api/workdays/${NO_ID}/publish`, expect: STAFF_404 },
  { method: 'post', path: `/api/workdays/${NO_ID}/cancel`, body: { message: 'Weather' }, expect: STAFF_404 },
  { method: 'post', path: `/api/workdays/${NO_ID}/complete`, expect: STAFF_404 },
  { method: 'post', path: `/api/workdays/${NO_ID}/signups`, body: {}, expect: { ...SIGNED_IN, volunteer: 400, coordinator: 400, admin: 400 } },
  { method: 'get', path: `/api/workdays/${NO_ID}/signups/mine`, expect: SIGNED_IN_404 },
  { method: 'delete', path: `/api/workdays/${NO_ID}/signups/mine`, expect: SIGNED_IN_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/crew`, expect: SIGNED_IN_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/roster`, expect: STAFF_404 },
  { method: 'get', path: '/api/signups/recent?limit=5', expect: STAFF },
  { method: 'post', path: `/api/signups/${NO_ID}/check-in`, body: {}, expect: STAFF_404 },
  { method: 'post', path: `/api/signups/${NO_ID}/check-out`, body: {}, expect: STAFF_404 },
  { method: 'post', path: `/api/signups/${NO_ID}/no-show`, expect: STAFF_404 },
  { method: 'put', path: `/api/signups/${NO_ID}/hours`, body: { minutes: 60, reason: 'Corrected' }, expect: STAFF_404 },
  { method: 'get', path: '/api/waiver', expect: ALL_OK },
  { method: 'post', path: '/api/waiver', body: {}, expect: { ...ADMIN, admin: 400 } },
  { method: 'get', path: '/api/me/profile', expect: SIGNED_IN },
  { method: 'patch', path: '/api/me/profile', body: {}, expect: SIGNED_IN },
  { method: 'get', path: '/api/me/workdays', expect: SIGNED_IN },
  { method: 'get', path: '/api/me/hours', expect: SIGNED_IN },
  { method: 'get', path: '/api/users', expect: ADMIN },
  { method: 'patch', path: `/api/users/${NOBODY_USER}/role`, body: { role: 'volunteer' }, expect: { ...ADMIN, admin: 404 } },
  { method: 'get', path: '/api/volunteers', expect: STAFF },
  { method: 'get', path: `/api/workdays/${NO_ID}.ics`, expect: ALL_404 },
  { method: 'get', path: `/api/calendar/workdays/${NO_ID}.ics`, expect: ALL_404 },
  { method: 'get', path: '/api/calendar/organisation.ics', expect: ALL_OK },
  { method: 'get', path: `/api/calendar/personal/${'A'.repeat(43)}.ics`, expect: ALL_404 },
  { method: 'get', path: '/api/me/calendar-token', expect: SIGNED_IN },
  { method: 'post', path: '/api/me/calendar-token', expect: SIGNED_IN },
  { method: 'delete', path: '/api/me/calendar-token', expect: { ...SIGNED_IN, volunteer: 204, coordinator: 204, admin: 204 } },
  { method: 'get', path: `/api/unsubscribe/reminders?u=${NOBODY_USER}&t=forged`, expect: { anon: 400, volunteer: 400, coordinator: 400, admin: 400 } },
  { method: 'get', path: '/api/batches', expect: SIGNED_IN },
  { method: 'get', path: `/api/batches/${NO_ID}`, expect: SIGNED_IN_404 },
  { method: 'post', path: '/api/batches', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'post', path: '/api/batches/import', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'get', path: '/api/trees', expect: SIGNED_IN },
  { method: 'get', path: `/api/trees/labels?batchId=${NO_ID}`, expect: SIGNED_IN_404 },
  { method: 'post', path: '/api/trees/bulk/move', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'get', path: `/api/trees/${NO_ID}`, expect: SIGNED_IN_404 },
  { method: 'patch', path: `/api/trees/${NO_ID}`, body: { healthy: true }, expect: STAFF_404 },
  { method: 'post', path: `/api/trees/${NO_ID}/measurements`, body: { heightCm: 10 }, expect: STAFF_404 },
  { method: 'get', path: `/api/trees/${NO_ID}/readiness`, expect: SIGNED_IN_404 },
  { method: 'get', path: '/api/tanks', expect: SIGNED_IN },
  { method: 'post', path: '/api/tanks', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'patch', path: `/api/tanks/${NO_ID}`, body: {}, expect: STAFF_404 },
  { method: 'post', path: `/api/tanks/${NO_ID}/readings`, body: { salinityPpt: 20 }, expect: STAFF_404 },
  { method: 'get', path: `/api/tanks/${NO_ID}/readings`, expect: SIGNED_IN_404 },
  { method: 'get', path: `/api/tanks/${NO_ID}/brining-plan?targetPpt=30`, expect: SIGNED_IN_404 },
  { method: 'post', path: `/api/tanks/${NO_ID}/measurement-round`, body: { measurements: [{ treeId: NO_ID, heightCm: 10 }] }, expect: STAFF_404 },
  { method: 'get', path: '/api/nursery/tasks', expect: SIGNED_IN },
  { method: 'get', path: `/api/sites/${NO_ID}/readiness`, expect: SIGNED_IN_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/reserved-trees`, expect: SIGNED_IN_404 },
  { method: 'post', path: `/api/workdays/${NO_ID}/reserved-trees`, body: { treeIds: [NO_ID] }, expect: STAFF_404 },
  { method: 'delete', path: `/api/workdays/${NO_ID}/reserved-trees/${NO_ID}`, expect: STAFF_404 },
  { method: 'post', path: '/api/photos', expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'get', path: `/api/photos/${NO_ID}`, expect: SIGNED_IN_404 },
  { method: 'get', path: `/api/photos/${NO_ID}/thumb`, expect: SIGNED_IN_404 },
  { method: 'get', path: '/api/fleet', expect: SIGNED_IN },
  { method: 'get', path: '/api/fleet/rule-of-thumb?lengthFt=16&beamFt=5', expect: SIGNED_IN },
  { method: 'post', path: '/api/fleet', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'patch', path: `/api/fleet/${NO_ID}`, body: {}, expect: STAFF_404 },
  { method: 'delete', path: `/api/fleet/${NO_ID}`, expect: STAFF_404 },
  { method: 'post', path: '/api/trip-plans/solve', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'post', path: `/api/workdays/${NO_ID}/trip-plan`, body: {}, expect: STAFF_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/trip-plan`, expect: STAFF_404 },
  { method: 'put', path: `/api/workdays/${NO_ID}/trip-plan`, body: { runs: [] }, expect: STAFF_404 },
  { method: 'post', path: '/api/trip-plans/capacity', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'get', path: `/api/workdays/${NO_ID}/capacity`, expect: STAFF_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/trip-plan/sheet.pdf`, expect: STAFF_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/trip-plan/float-plan.pdf`, expect: STAFF_404 },
  { method: 'get', path: `/api/workdays/${NO_ID}/plantings`, expect: STAFF_404 },
  { method: 'post', path: `/api/workdays/${NO_ID}/plantings`, body: { trees: [{ treeId: NO_ID }] }, expect: STAFF_404 },
  { method: 'delete', path: `/api/workdays/${NO_ID}/plantings/${NO_ID}`, expect: STAFF_404 },
  { method: 'post', path: '/api/monitoring-visits', body: {}, expect: { ...STAFF, coordinator: 400, admin: 400 } },
  { method: 'get', path: '/api/monitoring-visits', expect: STAFF },
  { method: 'get', path: `/api/monitoring-visits/${NO_ID}`, expect: STAFF_404 },
  { method: 'get', path: `/api/monitoring-visits/${NO_ID}/lookup?tag=T-0001`, expect: STAFF_404 },
  { method: 'put', path: `/api/monitoring-visits/${NO_ID}/checks/${NO_ID}`, body: { condition: 'alive' }, expect: STAFF_404 },
  { method: 'get', path: '/api/monitoring/due', expect: STAFF },
  ...['summary', 'hours', 'trees', 'survival', 'donations', 'summary.csv', 'hours.csv', 'trees.csv', 'survival.csv', 'donations.csv', 'report.pdf']
    .map((name) => ({ method: 'get' as const, path: `/api/reports/${name}?from=2026-01-01&to=2026-01-31`, expect: STAFF })),
  { method: 'get', path: '/api/campaigns', expect: ALL_OK },
  { method: 'get', path: '/api/campaigns/manage', expect: ADMIN },
  { method: 'get', path: `/api/campaigns/${NO_ID}`, expect: ALL_404 },
  { method: 'post', path: '/api/campaigns', body: {}, expect: { ...ADMIN, admin: 400 } },
  { method: 'patch', path: `/api/campaigns/${NO_ID}`, body: {}, expect: { ...ADMIN, admin: 404 } },
  { method: 'post', path: '/api/donations/checkout', body: {}, expect: { anon: 400, volunteer: 400, coordinator: 400, admin: 400 } },
  { method: 'get', path: `/api/donations/thanks/cs_test_${'0'.repeat(40)}`, expect: ALL_404 },
  { method: 'get', path: '/api/donations', expect: ADMIN },
  { method: 'get', path: '/api/donations/export.csv', expect: ADMIN },
  { method: 'post', path: `/api/donations/${NO_ID}/refund`, expect: { ...ADMIN, admin: 404 } },
  { method: 'post', path: '/api/webhooks/stripe', body: {}, expect: { anon: 400, volunteer: 400, coordinator: 400, admin: 400 } },
];

let t: TestApp;
const agents = new Map<Who, { agent: Agent; token: string }>();
beforeAll(async () => {
  t = await createTestApp();
  agents.set('anon', await csrfAgent(t.app));
  for (const role of ['volunteer', 'coordinator', 'admin'] as const) agents.set(role, await authAgentFor(t, role));
});
afterAll(() => t.close());

const cases = routes.flatMap((r) => (Object.keys(r.expect) as Who[]).map((who) => ({ ...r, who, status: r.expect[who] })));

describe('role × route access', () => {
  it.each(cases)('$method $path as $who → $status', async ({ method, path, body, who, status }) => {
    const { agent, token } = agents.get(who)!;
    let req = agent[method](path);
    req = req.set('X-CSRF-Token', token);
    const res = body ? await req.send(body) : await req;
    expect(res.status).toBe(status);
  });
});
