/** Whether the runtime knows `tz` as an IANA time zone (e.g. America/New_York). */
export function isTimeZone(tz: string): boolean {
  if (!tz.includes('/') && tz !== 'UTC') return false;
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
}
