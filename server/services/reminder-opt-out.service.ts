import { createHmac, timingSafeEqual } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { User } from '../db/entities/user.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** base64url HMAC-SHA256 of `reminders:<userId>` under the session secret: the link needs no stored token. */
export function reminderOptOutToken(secret: string, userId: string): string {
  return createHmac('sha256', secret).update(`reminders:${userId}`).digest('base64url');
}

export function reminderOptOutUrl(appUrl: string, secret: string, userId: string): string {
  const u = new URL('/api/unsubscribe/reminders', appUrl);
  u.searchParams.set('u', userId);
  u.searchParams.set('t', reminderOptOutToken(secret, userId));
  return u.toString();
}

/** Creates the profile row when the person has none yet, leaving existing values alone. */
export async function ensureProfile(tx: EntityManager, userId: string): Promise<void> {
  await tx.createQueryBuilder().insert().into(VolunteerProfile).values({ userId }).orIgnore().execute();
}

/** The unsubscribe-from-reminders link in crew e-mails. */
export function createReminderOptOutService(deps: { db: DataSource; secret: string }) {
  return {
    /** True when the link is genuine and the person is now opted out of reminders. */
    async optOut(userId: unknown, token: unknown): Promise<boolean> {
      if (typeof userId !== 'string' || typeof token !== 'string' || !UUID.test(userId)) return false;
      const expected = Buffer.from(reminderOptOutToken(deps.secret, userId));
      const given = Buffer.from(token);
      if (expected.length !== given.length || !timingSafeEqual(expected, given)) return false;
      return deps.db.transaction(async (tx) => {
        if (!(await tx.getRepository(User).existsBy({ id: userId }))) return false;
        await ensureProfile(tx, userId);
        await tx.getRepository(VolunteerProfile).update({ userId }, { remindersOptOut: true });
        return true;
      });
    },
  };
}
export type ReminderOptOutService = ReturnType<typeof createReminderOptOutService>;
