import { z } from 'zod';
import { RosterRow } from '@shared/schemas/roster.schema';
import { get, post, put } from './http';

const RosterResponse = z.object({ roster: z.array(RosterRow) });

function signupPath(signupId: string, action: string): string {
  return `/api/signups/${encodeURIComponent(signupId)}/${action}`;
}

/** Coordinators and admins: confirmed crew by role and name, then the waitlist in line order. */
export async function fetchRoster(workdayId: string): Promise<RosterRow[]> {
  return (await get(`/api/workdays/${encodeURIComponent(workdayId)}/roster`, RosterResponse)).roster;
}

/** The roster as a CSV download; a plain link, so the browser saves the file with the server's name. */
export function rosterCsvPath(workdayId: string): string {
  return `/api/workdays/${encodeURIComponent(workdayId)}/roster?format=csv`;
}

/** Checks a confirmed person in now; again after a mistake, it restarts their time and clears check-out. */
export async function checkIn(signupId: string): Promise<void> {
  await post(signupPath(signupId, 'check-in'), {});
}

/** 409 `conflict` when the person is not checked in. */
export async function checkOut(signupId: string): Promise<void> {
  await post(signupPath(signupId, 'check-out'), {});
}

/** Clears any check-in; the person is credited no hours. */
export async function markNoShow(signupId: string): Promise<void> {
  await post(signupPath(signupId, 'no-show'));
}

/** Sets the minutes credited; the reason is kept in the audit log with the before and after. */
export async function correctHours(signupId: string, body: { minutes: number; reason: string }): Promise<void> {
  await put(signupPath(signupId, 'hours'), body);
}
