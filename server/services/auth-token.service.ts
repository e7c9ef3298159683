import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { AuthToken, type AuthTokenPurpose } from '../db/entities/auth-token.entity.js';

const sha256 = (s: string) => createHash('sha256').update(s).digest('hex');

/** One-time link tokens: the raw token goes in the e-mail, only its hash is stored. */
export function createAuthTokenService(deps: { db: DataSource; clock: () => Date }) {
  const repo = deps.db.getRepository(AuthToken);
  return {
    async issue(userId: string, purpose: AuthTokenPurpose, ttlMinutes: number): Promise<string> {
      const raw = randomBytes(32).toString('base64url');
      const expiresAt = new Date(deps.clock().getTime() + ttlMinutes * 60_000);
      await repo.insert({ userId, purpose, tokenHash: sha256(raw), expiresAt });
      return raw;
    },
    /** Marks the token used and returns its user id; one UPDATE, so two racing uses cannot both win. */
    async consume(raw: string, purpose: AuthTokenPurpose): Promise<string | undefined> {
      const now = deps.clock();
      const result = await repo
        .createQueryBuilder()
        .update()
        .set({ usedAt: now })
        .where('token_hash = :hash AND purpose = :purpose AND used_at IS NULL AND expires_at > :now', { hash: sha256(raw), purpose, now })
        .returning(['userId'])
        .execute();
      const row = (result.raw as { user_id: string }[])[0];
      return row?.user_id;
    },
    /** Retires every open token of a purpose, e.g. older reset links once the password changed. */
    async revokeAll(userId: string, purpose: AuthTokenPurpose): Promise<void> {
      await repo
        .createQueryBuilder()
        .update()
        .set({ usedAt: deps.clock() })
        .where('user_id = :userId AND purpose = :purpose AND used_at IS NULL', { userId, purpose })
        .execute();
    },
  };
}
export type AuthTokenService = ReturnType<typeof createAuthTokenService>;
