import { describe, expect, it } from 'vitest';
import { SignupBody } from '@shared/schemas/crew.schema';
import { emptySignupForm, isMinor, isUnderMinimumAge, prefillFromProfile, serverFieldErrors, stepOfField, toSignupBody, validateUpTo, type SignupContext, type SignupForm } from '@/utils/signup-form';

const ctx: SignupContext = { day: '2025-03-15', minimumAge: 0, weightUnit: 'lb', waiverVersion: 3 };

function filled(overrides: Partial<SignupForm> = {}): SignupForm {
  return {
    ...emptySignupForm(),
    role: 'planter',
    dateOfBirth: '1990-04-02',
    emergencyContact: { name: 'Tomas Mendes', phone: '+1 727 555 0142' },
    waiver: { accepted: true, signedName: 'Rosa Mendes' },
    ...overrides,
  };
}

describe('signup form', () => {
  it('builds a body the shared SignupBody accepts, with only what the role needs', () => {
    const body = toSignupBody(filled({ note: '  I can bring a cooler  ' }), ctx);

    expect(SignupBody.safeParse(body).success).toBe(true);
    expect(body).toEqual({
      role: 'planter',
      waiver: { accepted: true, signedName: 'Rosa Mendes', version: 3 },
      emergencyContact: { name: 'Tomas Mendes', phone: '+1 727 555 0142' },
      skills: [],
      dateOfBirth: '1990-04-02',
      note: 'I can bring a cooler',
    });
  });

  it.each([
    // 1 lb = 0.45359237 kg exactly (international avoirdupois pound).
    ['lb', '350', 158.8],
    ['lb', '44.1', 20],
    ['kg', '150', 150],
  ] as const)('sends an own kayak load typed in %s (%s) as %s kg', (unit, typed, kg) => {
    const body = toSignupBody(filled({ role: 'own-kayak', ownCraft: { kind: 'canoe', seats: '2', maxLoad: typed } }), { ...ctx, weightUnit: unit });

    expect(body.ownCraft).toEqual({ kind: 'canoe', seats: 2, maxLoadKg: kg });
  });

  it.each([
    ['2007-03-16', true],
    ['2007-03-15', false],
  ])('counts someone born %s as a minor on 15 Mar 2025: %s', (dateOfBirth, minor) => {
    expect(isMinor(filled({ dateOfBirth }), ctx)).toBe(minor);
  });

  it('asks a minor for each of the guardian details, on the about-you step', () => {
    const errors = validateUpTo('about', filled({ dateOfBirth: '2012-01-01' }), ctx);

    expect(Object.keys(errors).sort()).toEqual(['guardian.name', 'guardian.phone', 'guardian.relationship', 'guardian.signedName']);
    expect(errors['guardian.relationship']).toBe('Say how they are related to you, for example parent');
  });

  it('leaves later steps alone: no waiver errors while on the role step', () => {
    const errors = validateUpTo('role', filled({ role: '', waiver: { accepted: false, signedName: '' } }), ctx);

    expect(errors).toEqual({ role: 'Choose a role' });
  });

  it('requires a date of birth and stops anyone under the minimum age', () => {
    expect(validateUpTo('about', filled({ dateOfBirth: '' }), ctx).dateOfBirth).toMatch(/Enter your date of birth/);
    const young = filled({ dateOfBirth: '2012-01-01' });
    expect(isUnderMinimumAge(young, { ...ctx, minimumAge: 16 })).toBe(true);
    expect(validateUpTo('about', young, { ...ctx, minimumAge: 16 }).dateOfBirth).toBe('Must be at least 16 years old on the day');
  });

  it('words the kayak limits in the display unit', () => {
    const errors = validateUpTo('about', filled({ role: 'own-kayak', ownCraft: { kind: '', seats: '', maxLoad: '10' } }), ctx);

    expect(errors['ownCraft.kind']).toBe('Choose the kind of craft');
    expect(errors['ownCraft.seats']).toBe('Enter the number of seats, 1 to 4');
    expect(errors['ownCraft.maxLoadKg']).toBe("Enter the maker's maximum load, 44.1 to 2204.6 lb");
  });

  it.each([
    ['role', 'role'],
    ['waiver.accepted', 'waiver'],
    ['waiver.version', 'waiver'],
    ['guardian', 'about'],
    ['guardian.userId', 'about'],
    ['dateOfBirth', 'about'],
    ['ownCraft', 'about'],
    ['emergencyContact.phone', 'about'],
  ])('shows %s on the %s step', (key, step) => {
    expect(stepOfField(key)).toBe(step);
  });

  it("sends the server's errors to the earliest step that has one", () => {
    expect(serverFieldErrors({ 'waiver.accepted': ['must be accepted'], guardian: ['is required for volunteers under 18'] })).toEqual({
      errors: { 'waiver.accepted': 'Must be accepted', guardian: 'Is required for volunteers under 18' },
      step: 'about',
      general: null,
    });
  });

  it('prefills from the profile without overwriting what was typed', () => {
    const form = emptySignupForm();
    form.emergencyContact = { name: 'Someone else', phone: '' };
    prefillFromProfile(form, { dateOfBirth: '1990-04-02', phone: null, emergencyContact: { name: 'Tomas', phone: '+1 555 0100' }, skills: ['first-aid'], remindersOptOut: false });

    expect(form.dateOfBirth).toBe('1990-04-02');
    expect(form.emergencyContact).toEqual({ name: 'Someone else', phone: '' });
    expect(form.skills).toEqual(['first-aid']);
  });
});
