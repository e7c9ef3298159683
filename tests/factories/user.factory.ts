import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { User } from '../../server/db/entities/user.entity.js';
import { createPasswordHasher } from '../../server/services/password-hasher.js';

export const TEST_PASSWORD = 'correct horse battery';
const hasher = createPasswordHasher(12);
let hashOnce: Promise<string> | undefined;

export const uniqueEmail = (prefix = 'user') => `${prefix}.${randomBytes(5).toString('hex')}@test.ebbroot.test`;

/** Inserts a user (password TEST_PASSWORD unless overridden) with a unique e-mail. */
export async function buildUser(db: DataSource, overrides: Partial<User> & { password?: string } = {}): Promise<User> {
  const { password, ...rest } = overrides;
  hashOnce ??= hasher.hash(TEST_PASSWORD);
  const passwordHash = password ? await hasher.hash(password) : await hashOnce;
  const repo = db.getRepository(User);
  return repo.save(repo.create({ name: 'Test Person', email: uniqueEmail(), role: 'volunteer', passwordHash, emailVerifiedAt: null, ...rest }));
}
