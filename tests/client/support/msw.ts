import { http, HttpResponse } from 'msw';
import type { PublicUser } from '@shared/schemas/user.schema';
import { server } from '../../setup/client-setup';

/** Answers GET /api/auth/me as `user`, or 401 when null. */
export function mockMe(user: PublicUser | null): void {
  server.use(
    http.get('/api/auth/me', () =>
      user
        ? HttpResponse.json({ user })
        : HttpResponse.json({ error: { code: 'unauthenticated', message: 'Sign in first' } }, { status: 401 }),
    ),
  );
}

/** An ErrorBody response, as the server's one error middleware writes it. */
export function errorResponse(status: number, code: string, message: string, fields?: Record<string, string[]>): Response {
  return HttpResponse.json({ error: { code, message, ...(fields ? { fields } : {}) } }, { status });
}
