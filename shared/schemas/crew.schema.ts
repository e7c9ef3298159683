import { z } from 'zod';

/** Crew roles a volunteer signs up for. */
export const CrewRole = z.enum(['own-kayak', 'seat', 'operator', 'shore', 'planter']);
export type CrewRole = z.infer<typeof CrewRole>;

export const CREW_ROLE_LABELS: Record<CrewRole, string> = {
  'own-kayak': 'Paddler with own kayak',
  seat: 'Paddler needing a seat',
  operator: 'Boat operator',
  shore: 'Shore crew',
  planter: 'Planter',
};

export const SignupStatus = z.enum(['confirmed', 'waitlisted', 'cancelled']);
export type SignupStatus = z.infer<typeof SignupStatus>;

export const CraftKind = z.enum(['sit-on-top-kayak', 'tandem-kayak', 'canoe', 'skiff', 'other']);
export type CraftKind = z.infer<typeof CraftKind>;

export const Skill = z.enum(['paddler', 'boat-operator', 'first-aid', 'planting', 'nursery', 'photography']);
export type Skill = z.infer<typeof Skill>;

const Phone = z.string().trim().min(5, { message: 'must be a phone number' }).max(40).regex(/^[+\d][\d\s().-]+$/, { message: 'must be a phone number' });

export const EmergencyContact = z.object({
  name: z.string().trim().min(1, { message: 'is required' }).max(120),
  phone: Phone,
});
export type EmergencyContact = z.infer<typeof EmergencyContact>;

/** A volunteer's own craft, brought to the workday. Load in kilograms (the maker's rating). */
export const OwnCraft = z.object({
  kind: CraftKind,
  seats: z.number().int().min(1).max(4),
  maxLoadKg: z.number().min(20).max(1000),
});
export type OwnCraft = z.infer<typeof OwnCraft>;

/** For a minor: a guardian on the same crew, or the guardian's details and signature. */
export const GuardianInput = z.union([
  z.object({ userId: z.string().uuid({ message: 'must be a crew member' }) }).strict(),
  z
    .object({
      name: z.string().trim().min(1, { message: 'is required' }).max(120),
      phone: Phone,
      email: z.email({ message: 'must be an e-mail address' }).optional(),
      relationship: z.string().trim().min(1).max(60),
      signedName: z.string().trim().min(1, { message: 'the guardian must type their full name' }).max(120),
    })
    .strict(),
]);
export type GuardianInput = z.infer<typeof GuardianInput>;

export const WaiverAcceptance = z.object({
  accepted: z.literal(true, { message: 'must be accepted' }),
  signedName: z.string().trim().min(2, { message: 'type your full name' }).max(120),
  /** The version the person read; refused when a newer one has been published since. */
  version: z.number().int().positive().optional(),
});

export const SignupBody = z
  .object({
    role: CrewRole,
    emergencyContact: EmergencyContact.optional(),
    waiver: WaiverAcceptance,
    guardian: GuardianInput.optional(),
    dateOfBirth: z.iso.date({ message: 'must be a date (YYYY-MM-DD)' }).optional(),
    skills: z.array(Skill).max(10).optional(),
    ownCraft: OwnCraft.optional(),
    operatorQualification: z.string().trim().max(300).optional(),
    note: z.string().trim().max(500).optional(),
  })
  .strict()
  .refine((b) => b.role !== 'own-kayak' || b.ownCraft, { message: 'describe the kayak you bring', path: ['ownCraft'] })
  .refine((b) => b.role !== 'operator' || (b.operatorQualification ?? '').length > 0, { message: 'say what qualifies you to run the boat', path: ['operatorQualification'] });
export type SignupBody = z.infer<typeof SignupBody>;

export const SignupResult = z.object({
  id: z.string().uuid(),
  status: z.enum(['confirmed', 'waitlisted']),
  role: CrewRole,
  position: z.number().int().positive().optional(),
});
export type SignupResult = z.infer<typeof SignupResult>;

export const RoleCapacity = z.object({ role: CrewRole, capacity: z.number().int().min(0).max(500) });
