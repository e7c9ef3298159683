import { afterAll, afterEach, beforeAll } from 'vitest';
import { cleanup } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import type { PublicOrganisation } from '@shared/schemas/organisation.schema';
import { resetCsrfToken } from '@/api/http';

export const CSRF_TOKEN = 'test-csrf-token';

/** What GET /api/organisation answers unless a test says otherwise: a real (not demo) organisation. */
export const DEFAULT_ORGANISATION: PublicOrganisation = {
  name: 'Harbour Fringe Restoration',
  isDemo: false,
  units: 'ft',
  timeZone: 'America/New_York',
  currency: 'usd',
};

/** MSW for client tests: any request without a handler fails the test. Add handlers with `server.use(...)`. */
export const server = setupServer(
  http.get('/api/auth/csrf', () => HttpResponse.json({ token: CSRF_TOKEN })),
  // The shell loads the organisation at start-up, so every app-level test needs an answer.
  http.get('/api/organisation', () => HttpResponse.json({ organisation: DEFAULT_ORGANISATION })),
  // The coordinator home lists workdays; tests about other pages that land there need an answer too.
  http.get('/api/workdays', () => HttpResponse.json({ workdays: [] })),
  // ...and the rest of "At the water": sites (trees ready per site), brining today, monitoring due, campaigns.
  http.get('/api/sites', () => HttpResponse.json({ sites: [] })),
  http.get('/api/nursery/tasks', () => HttpResponse.json({ date: '2025-01-01', tasks: [], skipped: [] })),
  http.get('/api/monitoring/due', () => HttpResponse.json({ today: '2025-01-01', toleranceDays: 14, sites: [] })),
  http.get('/api/campaigns', () => HttpResponse.json({ campaigns: [] })),
  // ...and who signed up or cancelled lately.
  http.get('/api/signups/recent', () => HttpResponse.json({ signups: [] })),
  // Workday pages list the trees set aside for the day (nursery.router.ts answers { trees: TreeRow[] }): none unless a test says so.
  http.get('/api/workdays/:id/reserved-trees', () => HttpResponse.json({ trees: [] })),
  // The volunteer home shows my workdays and this year's hours: nothing yet, unless a test says otherwise.
  http.get('/api/me/workdays', () => HttpResponse.json({ workdays: [] })),
  http.get('/api/me/hours', () => HttpResponse.json({ rows: [], totalMinutes: 0, totalHours: 0, workdaysAttended: 0, crewTreesPlanted: 0 })),
);

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  document.body.innerHTML = '';
  server.resetHandlers();
  resetCsrfToken();
});
afterAll(() => server.close());
