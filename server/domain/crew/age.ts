/** Ages for sign-up rules; dates are `YYYY-MM-DD` calendar dates (no time zone involved). */

/**
 * Whole years between a birth date and a day (a birthday counts on the day itself; someone
 * born on 29 February turns a year older on 1 March in common years).
 * @example ageOn('2010-06-15', '2026-06-14') // 15
 */
export function ageOn(dateOfBirth: string, day: string): number {
  const [by, bm, bd] = dateOfBirth.split('-').map(Number) as [number, number, number];
  const [y, m, d] = day.split('-').map(Number) as [number, number, number];
  let age = y - by;
  if (m < bm || (m === bm && d < bd)) age -= 1;
  return age;
}

/** Age of majority for waivers and guardianship (18 in every US state but a few; local law decides). */
export const ADULT_AGE = 18;

export const isMinorOn = (dateOfBirth: string, day: string) => ageOn(dateOfBirth, day) < ADULT_AGE;
