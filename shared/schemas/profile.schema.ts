import { z } from 'zod';
import { EmergencyContact, Skill } from './crew.schema.js';

/** A volunteer's own details, kept between sign-ups. Contact data: the person, coordinators and admins only. */
export const Profile = z.object({
  dateOfBirth: z.string().nullable(),
  phone: z.string().nullable(),
  emergencyContact: EmergencyContact.nullable(),
  skills: z.array(Skill),
  remindersOptOut: z.boolean(),
});
export type Profile = z.infer<typeof Profile>;

export const UpdateProfileBody = z
  .object({
    dateOfBirth: z.iso.date({ message: 'must be a date (YYYY-MM-DD)' }).nullable(),
    phone: z.string().trim().max(40).nullable(),
    emergencyContact: EmergencyContact.nullable(),
    skills: z.array(Skill).max(10),
    remindersOptOut: z.boolean(),
  })
  .partial()
  .strict();
export type UpdateProfileBody = z.infer<typeof UpdateProfileBody>;
