import { QueryFailedError, type DataSource, type EntityManager } from 'typeorm';
import type { SignupBody, SignupResult } from '../../shared/schemas/crew.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import type { Workday } from '../db/entities/workday.entity.js';
import { ageOn, isMinorOn } from '../domain/crew/age.js';
import { hasRoom, roleOffered } from '../domain/crew/places.js';
import { localDate } from '../domain/tide/time-zone.js';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../errors.js';
import type { CrewNotifier } from './crew-notifier.js';
import { capsOf, confirmedCounts, lockWorkday, promoteFromWaitlist, waitlistPosition } from './crew-places.js';
import type { SiteService } from './site.service.js';
import type { WaiverService } from './waiver.service.js';

const isUniqueViolation = (err: unknown) => err instanceof QueryFailedError && (err.driverError as { code?: string }).code === '23505';

async function resultOf(tx: EntityManager, s: Signup): Promise<SignupResult> {
  return s.status === 'waitlisted'
    ? { id: s.id, status: 'waitlisted', role: s.role, position: await waitlistPosition(tx, s) }
    : { id: s.id, status: 'confirmed', role: s.role };
}

export function createSignupService(deps: { db: DataSource; sites: SiteService; waivers: WaiverService; notifier: CrewNotifier; clock: () => Date }) {
  /** Minor rules on the workday's local date: minimum age, and a guardian for under-18s. */
  async function checkAge(tx: EntityManager, w: Workday, body: SignupBody, dob: string | null): Promise<boolean> {
    if (!dob) return false;
    const day = localDate(w.startsAt.getTime(), (await deps.sites.get(w.siteId)).timeZone);
    if (w.minimumAge > 0 && ageOn(dob, day) < w.minimumAge) {
      throw new ValidationError(`This workday is for ages ${w.minimumAge} and up`, { dateOfBirth: [`must be at least ${w.minimumAge} years old on the day`] });
    }
    if (!isMinorOn(dob, day)) return false;
    if (!body.guardian) throw new ValidationError('A parent or guardian must sign up with or for a minor', { guardian: ['is required for volunteers under 18'] });
    if ('userId' in body.guardian) {
      const onCrew = await tx.getRepository(Signup).findOne({ where: { workdayId: w.id, userId: body.guardian.userId, status: 'confirmed' } });
      if (!onCrew || onCrew.isMinor) throw new ValidationError('The guardian must already be on this crew', { 'guardian.userId': ['is not a confirmed adult on this crew'] });
    }
    return true;
  }

  async function saveProfile(tx: EntityManager, userId: string, body: SignupBody): Promise<VolunteerProfile> {
    const repo = tx.getRepository(VolunteerProfile);
    const profile = (await repo.findOneBy({ userId })) ?? repo.create({ userId, skills: [] });
    if (body.emergencyContact) profile.emergencyContact = body.emergencyContact;
    if (body.dateOfBirth) profile.dateOfBirth = body.dateOfBirth;
    if (body.skills) profile.skills = body.skills;
    return repo.save(profile);
  }

  async function signUpInTx(tx: EntityManager, userId: string, workdayId: string, body: SignupBody): Promise<{ result: SignupResult; created: boolean }> {
    const w = await lockWorkday(tx, workdayId);
    if (w.status !== 'published') throw new NotFoundError('Workday open for sign-up');
    if (w.startsAt <= deps.clock()) throw new ConflictError('This workday has already started');
    const existing = await tx.getRepository(Signup).findOne({ where: { workdayId, userId, status: 'confirmed' } })
      ?? (await tx.getRepository(Signup).findOne({ where: { workdayId, userId, status: 'waitlisted' } }));
    if (existing) return { result: await resultOf(tx, existing), created: false };
    const caps = await capsOf(tx, w);
    if (!roleOffered(caps, body.role)) throw new ValidationError('This workday does not need that role', { role: ['is not offered on this workday'] });
    const waiver = await deps.waivers.currentIn(tx);
    if (body.waiver.version !== undefined && body.waiver.version !== waiver.version) {
      throw new ConflictError('The waiver has changed since you read it; please read the current version', { 'waiver.version': [`the current version is ${waiver.version}`] });
    }
    const profile = await saveProfile(tx, userId, body);
    const isMinor = await checkAge(tx, w, body, profile.dateOfBirth);
    const now = deps.clock();
    const status = hasRoom(caps, await confirmedCounts(tx, w.id), body.role) ? 'confirmed' : 'waitlisted';
    const guardian = body.guardian && !('userId' in body.guardian) ? { ...body.guardian, signedAt: now.toISOString() } : null;
    const signup = await tx.getRepository(Signup).save(tx.getRepository(Signup).create({
      workdayId, userId, role: body.role, status, queuedAt: now,
      waiverVersion: waiver.version, waiverSignedName: body.waiver.signedName, waiverSignedAt: now,
      isMinor, guardianUserId: body.guardian && 'userId' in body.guardian ? body.guardian.userId : null, guardian,
      ownCraft: body.ownCraft ?? null, operatorQualification: body.operatorQualification ?? '', note: body.note ?? '',
    }));
    await (status === 'confirmed' ? deps.notifier.signupConfirmed(tx, signup.id) : deps.notifier.signupWaitlisted(tx, signup.id));
    return { result: await resultOf(tx, signup), created: true };
  }

  return {
    /** Signs up or joins the waitlist; a second call for the same person returns their place. */
    async signUp(userId: string, workdayId: string, body: SignupBody): Promise<{ result: SignupResult; created: boolean }> {
      try {
        const out = await deps.db.transaction((tx) => signUpInTx(tx, userId, workdayId, body));
        await deps.notifier.flush();
        return out;
      } catch (err) {
        if (!isUniqueViolation(err)) throw err;
        // A racing request for the same person won; answer with the place it got.
        return { result: await deps.db.transaction(async (tx) => resultOf(tx, await tx.getRepository(Signup).findOneOrFail({ where: [{ workdayId, userId, status: 'confirmed' }, { workdayId, userId, status: 'waitlisted' }] }))), created: false };
      }
    },

    async mine(userId: string, workdayId: string): Promise<SignupResult> {
      return deps.db.transaction(async (tx) => {
        const s = await tx.getRepository(Signup).findOne({ where: [{ workdayId, userId, status: 'confirmed' }, { workdayId, userId, status: 'waitlisted' }] });
        if (!s) throw new NotFoundError('Sign-up');
        return resultOf(tx, s);
      });
    },

    /** Gives the place up; the first in line who fits is promoted and told. Refused once the workday started. */
    async cancelMine(userId: string, workdayId: string): Promise<void> {
      await deps.db.transaction(async (tx) => {
        const w = await lockWorkday(tx, workdayId);
        const s = await tx.getRepository(Signup).findOne({ where: [{ workdayId, userId, status: 'confirmed' }, { workdayId, userId, status: 'waitlisted' }] });
        if (!s) throw new NotFoundError('Sign-up');
        if (w.startsAt <= deps.clock()) throw new AppError(409, 'conflict', 'The workday has started; tell the coordinator at the launch instead');
        await tx.getRepository(Signup).update({ id: s.id }, { status: 'cancelled', cancelledAt: deps.clock() });
        await promoteFromWaitlist(tx, w, deps.notifier);
      });
      await deps.notifier.flush();
    },
  };
}
export type SignupService = ReturnType<typeof createSignupService>;
