import { z } from 'zod';
import { CrewRole } from '@shared/schemas/crew.schema';
import { MyHours } from '@shared/schemas/my-hours.schema';
import { Profile } from '@shared/schemas/profile.schema';
import { WorkdayDto } from '@shared/schemas/workday.schema';
import { get, queryString } from './http';

/** One of my workdays: the workday and my place on it (a waitlist position only while waiting). */
export const MyWorkday = z.object({
  workday: WorkdayDto,
  signup: z.object({
    id: z.string(),
    role: CrewRole,
    status: z.enum(['confirmed', 'waitlisted']),
    position: z.number().int().positive().nullable().optional(),
  }),
});
export type MyWorkday = z.infer<typeof MyWorkday>;

export { HoursRow, MyHours } from '@shared/schemas/my-hours.schema';

const ProfileResponse = z.object({ profile: Profile });
const MyWorkdaysResponse = z.object({ workdays: z.array(MyWorkday) });

/** My date of birth, phone, emergency contact and skills, kept from earlier sign-ups. */
export async function fetchProfile(): Promise<Profile> {
  return (await get('/api/me/profile', ProfileResponse)).profile;
}

/** The workdays I am on or waiting for, by start time, cancelled ones included. */
export async function fetchMyWorkdays(): Promise<MyWorkday[]> {
  return (await get('/api/me/workdays', MyWorkdaysResponse)).workdays;
}

/** My hours per workday attended, newest first; `from` inclusive and `to` exclusive, as 'YYYY-MM-DD'. */
export async function fetchMyHours(period: { from?: string; to?: string } = {}): Promise<MyHours> {
  return get(`/api/me/hours${queryString(period)}`, MyHours);
}
