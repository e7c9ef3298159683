/** Volunteer time from check-in and check-out, or a coordinator's correction. */

export interface Attendance {
  checkedInAt: Date | null;
  checkedOutAt: Date | null;
  minutesOverride: number | null;
  noShow: boolean;
}

/**
 * Minutes credited for one workday: the coordinator's correction when there is one, else
 * check-out minus check-in rounded to the minute, else 0 (no-shows and open check-ins count 0).
 * @example minutesWorked({ checkedInAt: new Date('2026-01-01T13:00Z'), checkedOutAt: new Date('2026-01-01T17:30Z'), minutesOverride: null, noShow: false }) // 270
 */
export function minutesWorked(a: Attendance): number {
  if (a.noShow) return 0;
  if (a.minutesOverride !== null) return a.minutesOverride;
  if (!a.checkedInAt || !a.checkedOutAt) return 0;
  return Math.max(0, Math.round((a.checkedOutAt.getTime() - a.checkedInAt.getTime()) / 60_000));
}

/** Hours with two decimals, for reports. */
export const hoursFromMinutes = (minutes: number) => Math.round((minutes / 60) * 100) / 100;
