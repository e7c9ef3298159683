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

    /** Admins change roles; the last admin cannot demote themselves into a locked-out organisation. */
    async changeRole(userId: string, role: Role): Promise<PublicUser> {
      return deps.db.transaction(async (tx) => {
        const users = tx.getRepository(User);
        const user = await users.findOne({ where: { id: userId }, lock: { mode: 'pessimistic_write' } });
        if (!user) throw new NotFoundError('User');
        if (user.role === 'admin' && role !== 'admin') {
          const admins = await users.countBy({ role: 'admin' });
          if (admins <= 1) throw new ValidationError('An organisation needs at least one admin', { role: ['the last admin must stay admin'] });
        }
        user.role = role;
        await users.save(user);
        return toPublicUser(user);
      });
    },
  };
}
export type UserService = ReturnType<typeof createUserService>;
