import { randomUUID } from 'node:crypto';
import type { PublicUser } from '@shared/schemas/user.schema';
import type { PersonRow } from '@/api/users';

export function buildUser(overrides: Partial<PublicUser> = {}): PublicUser {
  return {
    id: randomUUID(),
    name: 'Rosa Mendes',
    email: `rosa.${randomUUID().slice(0, 8)}@example.test`,
    role: 'volunteer',
    emailVerified: true,
    ...overrides,
  };
}

export function buildPerson(overrides: Partial<PersonRow> = {}): PersonRow {
  return { ...buildUser(overrides), createdAt: '2025-02-03T10:00:00.000Z', ...overrides };
}
