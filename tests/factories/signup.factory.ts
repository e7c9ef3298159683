import type { DataSource } from 'typeorm';
import { Signup } from '../../server/db/entities/signup.entity.js';
import { VolunteerProfile } from '../../server/db/entities/volunteer-profile.entity.js';

/** A confirmed sign-up with an accepted waiver (version 1); pass `queuedAt` to order a waitlist. */
export async function buildSignup(db: DataSource, fields: Pick<Signup, 'workdayId' | 'userId'> & Partial<Signup>): Promise<Signup> {
  const repo = db.getRepository(Signup);
  const now = new Date();
  return repo.save(repo.create({
    role: 'planter',
    status: 'confirmed',
    queuedAt: now,
    waiverVersion: 1,
    waiverSignedName: 'Test Person',
    waiverSignedAt: now,
    ...fields,
  }));
}

/** Sets (or creates) the person's volunteer profile fields. */
export async function setProfile(db: DataSource, userId: string, fields: Partial<VolunteerProfile>): Promise<void> {
  await db.getRepository(VolunteerProfile).upsert({ userId, ...fields }, ['userId']);
}
