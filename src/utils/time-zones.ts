/** The device's own IANA time zone, e.g. "Europe/Lisbon". */
export function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone;
}

/**
 * The IANA time zones the browser knows, for a picker; null where the browser can't list them
 * (`Intl.supportedValuesOf` is missing before Safari 15.4 and Chrome 99), so the form falls back
 * to a text box. UTC is added because some engines leave it out of the list.
 */
export function timeZoneChoices(): string[] | null {
  try {
    if (typeof Intl.supportedValuesOf !== 'function') return null;
    const zones = Intl.supportedValuesOf('timeZone');
    return zones.includes('UTC') ? zones : ['UTC', ...zones];
  } catch {
    return null;
  }
}
