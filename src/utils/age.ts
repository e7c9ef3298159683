/**
 * Ages for the sign-up rules, on calendar dates 'YYYY-MM-DD' (no time zone involved). The same rule
 * as the server's (server/domain/crew/age.ts), so the stepper can ask for a guardian before sending.
 */

/** Age of majority for waivers and guardianship (18 in most US states; local law decides). */
export const ADULT_AGE = 18;

/**
 * Whole years between a birth date and a day; a birthday counts on the day itself.
 * @example ageOn('2010-06-15', '2026-06-14') // 15
 */
export function ageOn(dateOfBirth: string, day: string): number {
  const [by = 0, bm = 1, bd = 1] = dateOfBirth.split('-').map(Number);
  const [y = 0, m = 1, d = 1] = day.split('-').map(Number);
  let age = y - by;
  if (m < bm || (m === bm && d < bd)) age -= 1;
  return age;
}
