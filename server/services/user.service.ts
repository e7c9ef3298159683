import type { DataSource } from 'typeorm';
import type { PublicUser, Role } from '../../shared/schemas/user.schema.js';
import { User } from '../db/entities/user.entity.js';
import { NotFoundError, ValidationError } from '../errors.js';

export interface UserRow extends PublicUser {
  createdAt: string;
}

export function toPublicUser(u: User): PublicUser {
  return { id: u.id, name: u.name, email: u.email, role: u.role, emailVerified: u.emailVerifiedAt !== null };
}

const toRow = (u: User): UserRow => ({ ...toPublicUser(u), createdAt: u.createdAt.toISOString() });

export function createUserService(deps: { db: DataSource }) {
  const repo = deps.db.getRepository(User);
  return {
    findById: (id: string) => repo.findOneBy({ id }),

    async list(filter: { q?: string; role?: Role }): Promise<UserRow[]> {
      const qb = repo.createQueryBuilder('u').orderBy('u.name', 'ASC').limit(500);
      if (filter.role) qb.andWhere('u.role = :role', { role: filter.role });
      if (filter.q) qb.andWhere('(u.name ILIKE :q OR u.email ILIKE :q)', { q: `%${filter.q.replace(/[%_\\]/g, '\\$&')}%` });
      return (await qb.getMany()).map(toRow);
    },

    /**
     * Admins change roles, but never their own: so the last admin can never be demoted and an
     * organisation cannot lock itself out.
     */
    async changeRole(actorId: string, userId: string, role: Role): Promise<PublicUser> {
      if (actorId === userId) throw new ValidationError('You cannot change your own role; ask another admin', { role: ['cannot change your own role'] });
      const user = await repo.findOneBy({ id: userId });
      if (!user) throw new NotFoundError('User');
      user.role = role;
      return toPublicUser(await repo.save(user));
    },
  };
}
export type UserService = ReturnType<typeof createUserService>;
