import { fieldsFromIssues } from '@shared/errors';
import { GuardianInput, SignupBody, type CraftKind, type CrewRole, type Skill } from '@shared/schemas/crew.schema';
import type { Profile } from '@shared/schemas/profile.schema';
import { ADULT_AGE, ageOn } from './age';
import { sentence } from './error-message';
import { fromKilograms, toKilograms, type WeightUnit } from './weight';
import { isDateKey, type DateKey } from './zoned-time';

/** The stepper's steps in order; `done` shows the result. */
export type SignupStep = 'role' | 'about' | 'waiver' | 'done';
/** The steps with fields. */
export type SignupFormStep = Exclude<SignupStep, 'done'>;
export const SIGNUP_STEPS: readonly { id: SignupStep; label: string }[] = [
  { id: 'role', label: 'Role' },
  { id: 'about', label: 'About you' },
  { id: 'waiver', label: 'Waiver' },
  { id: 'done', label: 'Done' },
];

/** What the stepper's fields hold; numbers stay text until sent, so a half-typed value is kept. */
export interface SignupForm {
  role: CrewRole | '';
  dateOfBirth: string;
  emergencyContact: { name: string; phone: string };
  skills: Skill[];
  ownCraft: { kind: CraftKind | ''; seats: string; maxLoad: string };
  operatorQualification: string;
  note: string;
  guardian: { name: string; phone: string; email: string; relationship: string; signedName: string };
  waiver: { accepted: boolean; signedName: string };
}

/** The facts of the workday and the organisation the rules depend on. */
export interface SignupContext {
  /** The workday's date at its site: ages are counted on it. */
  day: DateKey;
  minimumAge: number;
  weightUnit: WeightUnit;
  waiverVersion: number | null;
}

/** Limits of OwnCraft.maxLoadKg in shared/schemas/crew.schema.ts. */
const MAX_LOAD_KG = { min: 20, max: 1000 };
const GuardianDetails = GuardianInput.options[1];

/** A fresh, empty form; prefillFromProfile adds what the profile knows. */
export function emptySignupForm(): SignupForm {
  return {
    role: '',
    dateOfBirth: '',
    emergencyContact: { name: '', phone: '' },
    skills: [],
    ownCraft: { kind: '', seats: '1', maxLoad: '' },
    operatorQualification: '',
    note: '',
    guardian: { name: '', phone: '', email: '', relationship: '', signedName: '' },
    waiver: { accepted: false, signedName: '' },
  };
}

/** The volunteer's age on the workday's date, or null until a date of birth is entered. */
export function ageOnDay(form: SignupForm, ctx: SignupContext): number | null {
  return isDateKey(form.dateOfBirth) ? ageOn(form.dateOfBirth, ctx.day) : null;
}

export function isMinor(form: SignupForm, ctx: SignupContext): boolean {
  const age = ageOnDay(form, ctx);
  return age !== null && age < ADULT_AGE;
}

export function isUnderMinimumAge(form: SignupForm, ctx: SignupContext): boolean {
  const age = ageOnDay(form, ctx);
  return ctx.minimumAge > 0 && age !== null && age < ctx.minimumAge;
}

function numberOrNaN(text: string): number {
  return text.trim() === '' ? Number.NaN : Number(text);
}

function guardianBody(form: SignupForm): Record<string, string> {
  const { email, ...rest } = form.guardian;
  return email.trim() ? { ...rest, email: email.trim() } : rest;
}

/** The request body as the server expects it (SignupBody), built from the form; not yet validated. */
export function toSignupBody(form: SignupForm, ctx: SignupContext): Record<string, unknown> {
  const body: Record<string, unknown> = {
    role: form.role,
    waiver: { accepted: form.waiver.accepted, signedName: form.waiver.signedName, ...(ctx.waiverVersion ? { version: ctx.waiverVersion } : {}) },
    emergencyContact: { ...form.emergencyContact },
    skills: [...form.skills],
  };
  if (form.dateOfBirth) body.dateOfBirth = form.dateOfBirth;
  if (isMinor(form, ctx)) body.guardian = guardianBody(form);
  if (form.role === 'own-kayak') {
    const load = numberOrNaN(form.ownCraft.maxLoad);
    body.ownCraft = { kind: form.ownCraft.kind, seats: numberOrNaN(form.ownCraft.seats), maxLoadKg: Number.isFinite(load) ? toKilograms(load, ctx.weightUnit) : load };
  }
  if (form.role === 'operator') body.operatorQualification = form.operatorQualification;
  if (form.note.trim()) body.note = form.note.trim();
  return body;
}

/** Which step shows a field, for client and server errors alike (keys are SignupBody paths). */
export function stepOfField(key: string): SignupFormStep {
  if (key === 'role') return 'role';
  if (key === 'waiver' || key.startsWith('waiver.')) return 'waiver';
  return 'about';
}

/** Clearer words where the shared schema has only zod's defaults. */
function friendly(key: string, ctx: SignupContext): string | undefined {
  const unit = ctx.weightUnit;
  const messages: Record<string, string> = {
    role: 'Choose a role',
    'ownCraft.kind': 'Choose the kind of craft',
    'ownCraft.seats': 'Enter the number of seats, 1 to 4',
    'ownCraft.maxLoadKg': `Enter the maker's maximum load, ${fromKilograms(MAX_LOAD_KG.min, unit)} to ${fromKilograms(MAX_LOAD_KG.max, unit)} ${unit}`,
    'guardian.relationship': 'Say how they are related to you, for example parent',
  };
  return messages[key];
}

function firstMessages(fields: Record<string, string[]>, ctx?: SignupContext): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, messages] of Object.entries(fields)) {
    const text = (ctx && friendly(key, ctx)) ?? messages[0];
    if (text) out[key] = sentence(text);
  }
  return out;
}

/** Rules the client adds: a date of birth (the age rules need it), in the past, and old enough. */
function ageErrors(form: SignupForm, ctx: SignupContext): Record<string, string> {
  if (!form.dateOfBirth) return { dateOfBirth: 'Enter your date of birth: the age rules for the day depend on it' };
  const age = ageOnDay(form, ctx);
  if (age === null || age < 0) return { dateOfBirth: 'Must be a date before the workday' };
  if (isUnderMinimumAge(form, ctx)) return { dateOfBirth: `Must be at least ${ctx.minimumAge} years old on the day` };
  return {};
}

const ORDER: readonly SignupFormStep[] = ['role', 'about', 'waiver'];

/**
 * Errors on the fields of `step` and the steps before it, checked with the shared SignupBody (the
 * guardian against its details form, so each of its fields gets its own message).
 */
export function validateUpTo(step: SignupFormStep, form: SignupForm, ctx: SignupContext): Record<string, string> {
  const { guardian, ...body } = toSignupBody(form, ctx);
  const parsed = SignupBody.safeParse(body);
  const errors = parsed.success ? {} : firstMessages(fieldsFromIssues(parsed.error.issues), ctx);
  if (guardian) {
    const g = GuardianDetails.safeParse(guardian);
    if (!g.success) Object.assign(errors, firstMessages(fieldsFromIssues(g.error.issues.map((i) => ({ ...i, path: ['guardian', ...i.path] }))), ctx));
  }
  Object.assign(errors, ageErrors(form, ctx));
  const last = ORDER.indexOf(step);
  return Object.fromEntries(Object.entries(errors).filter(([key]) => ORDER.indexOf(stepOfField(key)) <= last));
}

/**
 * Server `fields` as one message per field, the first step that shows one of them, and any
 * message for the form as a whole (the `_` key).
 */
export function serverFieldErrors(fields: Record<string, string[]>): { errors: Record<string, string>; step: SignupFormStep; general: string | null } {
  const { _: general, ...errors } = firstMessages(fields);
  const steps = Object.keys(errors).map(stepOfField);
  return { errors, step: ORDER.find((s) => steps.includes(s)) ?? 'waiver', general: general ?? null };
}

/** Fills the fields a profile knows, leaving anything already typed alone. */
export function prefillFromProfile(form: SignupForm, profile: Profile): void {
  if (!form.dateOfBirth && profile.dateOfBirth) form.dateOfBirth = profile.dateOfBirth;
  if (!form.emergencyContact.name && !form.emergencyContact.phone && profile.emergencyContact) {
    form.emergencyContact = { ...profile.emergencyContact };
  }
  if (form.skills.length === 0) form.skills = [...profile.skills];
}
