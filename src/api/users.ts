import { z } from 'zod';
import { PublicUser, type Role } from '@shared/schemas/user.schema';
import { get, patch, queryString } from './http';

/** A row of the people list: the public user plus when the account was made (ISO 8601). */
export const PersonRow = PublicUser.extend({ createdAt: z.string() });
export type PersonRow = z.infer<typeof PersonRow>;

const PeopleResponse = z.object({ users: z.array(PersonRow) });
const UserResponse = z.object({ user: PublicUser });

export interface PeopleQuery {
  q?: string;
  role?: Role;
}

/** Admin only: every account, with optional search and role filter. */
export async function listUsers(query: PeopleQuery = {}): Promise<PersonRow[]> {
  return (await get(`/api/users${queryString({ q: query.q, role: query.role })}`, PeopleResponse)).users;
}

/** Admin only. */
export async function changeRole(id: string, role: Role): Promise<PublicUser> {
  return (await patch(`/api/users/${encodeURIComponent(id)}/role`, { role }, UserResponse)).user;
}
