import type { Role } from '@shared/schemas/user.schema';

export const ROLES: readonly Role[] = ['volunteer', 'coordinator', 'admin'];

const LABELS: Record<Role, string> = {
  volunteer: 'Volunteer',
  coordinator: 'Coordinator',
  admin: 'Admin',
};

export function roleLabel(role: Role): string {
  return LABELS[role];
}

/** "Ana López" → "Ana"; used for greetings only. */
export function firstName(name: string): string {
  const trimmed = name.trim();
  const space = trimmed.indexOf(' ');
  return space > 0 ? trimmed.slice(0, space) : trimmed;
}
