import { createHash } from 'node:crypto';

export interface Identity {
  name: string;
  email: string;
}

/** Preset people offered as one-click buttons on the sign-in page. */
export const PRESET_IDENTITIES: ReadonlyArray<Identity & { key: string }> = [
  { key: 'rowan', name: 'Rowan Test', email: 'rowan.test@example.com' },
  { key: 'marisol', name: 'Marisol Test', email: 'marisol.test@example.com' },
  { key: 'kofi', name: 'Kofi Test', email: 'kofi.test@example.com' },
  { key: 'ana', name: 'Ana Test', email: 'ana.test@example.com' },
];

/** OpenID Connect userinfo claims, in the shape the hosted provider returns. */
export interface UserInfo {
  sub: string;
  name: string;
  given_name: string;
  family_name: string;
  email: string;
  email_verified: true;
  locale: 'en';
}

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function isPlausibleEmail(value: string): boolean {
  return EMAIL.test(value);
}

/**
 * A stable, digits-only subject for an email, 21 digits like the hosted provider's,
 * so the same test person signs in as the same account across runs and restarts.
 */
export function subjectFor(email: string): string {
  const hex = createHash('sha256').update(email.trim().toLowerCase()).digest('hex');
  const digits = (BigInt(`0x${hex.slice(0, 20)}`) % 10n ** 20n).toString().padStart(20, '0');
  return `1${digits}`;
}

export function userInfoFor(identity: Identity): UserInfo {
  const [givenName = '', ...rest] = identity.name.trim().split(/\s+/);
  return {
    sub: subjectFor(identity.email),
    name: identity.name.trim(),
    given_name: givenName,
    family_name: rest.join(' '),
    email: identity.email.trim(),
    email_verified: true,
    locale: 'en',
  };
}
