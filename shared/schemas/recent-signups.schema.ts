import { z } from 'zod';
import { CrewRole, SignupStatus } from './crew.schema.js';

/** `GET /api/signups/recent?limit=`: how many of the latest sign-ups and cancellations to list (1–50, 10 by default). */
export const RecentSignupsQuery = z.object({ limit: z.coerce.number().int().min(1).max(50).default(10) });
export type RecentSignupsQuery = z.infer<typeof RecentSignupsQuery>;

/**
 * One sign-up or cancellation on an upcoming workday. `at` is when it happened: the cancellation
 * time for a cancelled place, else when the person signed up (or joined the waitlist).
 */
export const RecentSignup = z.object({
  signupId: z.string(),
  name: z.string(),
  role: CrewRole,
  status: SignupStatus,
  at: z.string(),
  workday: z.object({ id: z.string(), title: z.string(), startsAt: z.string() }),
});
export type RecentSignup = z.infer<typeof RecentSignup>;

export const RecentSignups = z.object({ signups: z.array(RecentSignup) });
export type RecentSignups = z.infer<typeof RecentSignups>;
