import { z } from 'zod';
import { CrewRole, EmergencyContact, OwnCraft, SignupStatus, Skill } from './crew.schema.js';

/** One row of a workday's roster (coordinators and admins only: it carries contact data). */
export const RosterRow = z.object({
  signupId: z.string().uuid(),
  userId: z.string().uuid(),
  name: z.string(),
  email: z.string(),
  emailVerified: z.boolean(),
  role: CrewRole,
  status: SignupStatus,
  position: z.number().int().positive().nullable(),
  waiverVersion: z.number(),
  waiverSignedName: z.string(),
  waiverSignedAt: z.string(),
  isMinor: z.boolean(),
  guardianName: z.string().nullable(),
  ageNotGiven: z.boolean(),
  skills: z.array(Skill),
  ownCraft: OwnCraft.nullable(),
  operatorQualification: z.string(),
  emergencyContact: EmergencyContact.nullable(),
  phone: z.string().nullable(),
  note: z.string(),
  checkedInAt: z.string().nullable(),
  checkedOutAt: z.string().nullable(),
  noShow: z.boolean(),
  minutes: z.number(),
  minutesOverridden: z.boolean(),
});
export type RosterRow = z.infer<typeof RosterRow>;

export const CheckInBody = z.object({ at: z.iso.datetime({ offset: true }).optional() }).strict();
export const HoursBody = z
  .object({
    minutes: z.number().int().min(0).max(24 * 60),
    reason: z.string().trim().min(3, { message: 'say why the hours change' }).max(500),
  })
  .strict();
export const SignupIdParams = z.object({ id: z.string().uuid({ message: 'must be a sign-up id' }) });

/** What a volunteer sees of the rest of the crew: first names and roles only. */
export const CrewMember = z.object({ firstName: z.string(), role: CrewRole });
