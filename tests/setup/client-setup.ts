import { afterAll, afterEach, beforeAll } from 'vitest';
import { cleanup } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import { setupServer } from 'msw/node';
import { resetCsrfToken } from '@/api/http';

export const CSRF_TOKEN = 'test-csrf-token';

/** MSW for client tests: any request without a handler fails the test. Add handlers with `server.use(...)`. */
export const server = setupServer(http.get('/api/auth/csrf', () => HttpResponse.json({ token: CSRF_TOKEN })));

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  document.body.innerHTML = '';
  server.resetHandlers();
  resetCsrfToken();
});
afterAll(() => server.close());
