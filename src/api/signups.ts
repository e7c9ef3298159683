import { z } from 'zod';
import { SignupResult, type SignupBody } from '@shared/schemas/crew.schema';
import { RecentSignups, type RecentSignup } from '@shared/schemas/recent-signups.schema';
import { CrewMember } from '@shared/schemas/roster.schema';
import { ApiError, del, get, post, queryString } from './http';

/** The waiver a volunteer accepts when signing up; a new text is a new version. */
export const Waiver = z.object({ version: z.number(), text: z.string(), guardianText: z.string(), createdAt: z.string() });
export type Waiver = z.infer<typeof Waiver>;

/** A crew member as other volunteers see them: first name and role. */
export type CrewMate = z.infer<typeof CrewMember>;

const WaiverResponse = z.object({ waiver: Waiver });
const CrewResponse = z.object({ crew: z.array(CrewMember) });

function signupsPath(workdayId: string, mine = false): string {
  return `/api/workdays/${encodeURIComponent(workdayId)}/signups${mine ? '/mine' : ''}`;
}

/** Anyone: the current waiver text and, for minors, the guardian's text. */
export async function fetchCurrentWaiver(): Promise<Waiver> {
  return (await get('/api/waiver', WaiverResponse)).waiver;
}

/**
 * Signs the person in for a role, or puts them on the waitlist. Answers with the existing place
 * when they are already signed up. 400 `validation_failed` with `fields` (e.g. `guardian`,
 * `dateOfBirth`, `role`, `waiver.accepted`), 404 when not open for sign-up, 409 once started or
 * when the waiver changed since it was read (`fields['waiver.version']`).
 */
export async function signUp(workdayId: string, body: SignupBody): Promise<SignupResult> {
  return post(signupsPath(workdayId), body, SignupResult);
}

/** The signed-in person's place on this workday, or null when they have none. */
export async function fetchMySignup(workdayId: string): Promise<SignupResult | null> {
  try {
    return await get(signupsPath(workdayId, true), SignupResult);
  } catch (err) {
    if (err instanceof ApiError && err.status === 404) return null;
    throw err;
  }
}

/** Gives the place up (the first in line moves up); 409 `conflict` once the workday has started. */
export async function cancelMySignup(workdayId: string): Promise<void> {
  await del(signupsPath(workdayId, true));
}

/** Signed in: the confirmed crew's first names and roles (no contact details). */
export async function fetchCrew(workdayId: string): Promise<CrewMate[]> {
  return (await get(`/api/workdays/${encodeURIComponent(workdayId)}/crew`, CrewResponse)).crew;
}

/** Coordinators and admins: the latest sign-ups and cancellations on upcoming workdays, newest first. */
export async function fetchRecentSignups(limit: number): Promise<RecentSignup[]> {
  return (await get(`/api/signups/recent${queryString({ limit: String(limit) })}`, RecentSignups)).signups;
}
