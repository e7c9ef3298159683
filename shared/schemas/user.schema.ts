import { z } from 'zod';

export const Role = z.enum(['volunteer', 'coordinator', 'admin']);
export type Role = z.infer<typeof Role>;

/** What the API tells about a user; never the password hash. */
export const PublicUser = z.object({
  id: z.string().uuid(),
  name: z.string(),
  email: z.string(),
  role: Role,
  emailVerified: z.boolean(),
});
export type PublicUser = z.infer<typeof PublicUser>;

export const ListUsersQuery = z.object({
  q: z.string().trim().max(200).optional(),
  role: Role.optional(),
});
export type ListUsersQuery = z.infer<typeof ListUsersQuery>;

export const ChangeRoleBody = z.object({ role: Role });
export type ChangeRoleBody = z.infer<typeof ChangeRoleBody>;

export const UserIdParams = z.object({ id: z.string().uuid({ message: 'must be a user id' }) });
