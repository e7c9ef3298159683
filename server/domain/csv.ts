/** CSV text (RFC 4180) for exports; pure. */

/**
 * One cell: quoted when it holds a comma, quote or line break; a leading =, +, -, @, tab or
 * carriage return gets a ' so spreadsheets do not run it as a formula (CSV injection; the
 * characters OWASP's "CSV Injection" page lists).
 * @example csvCell('Smith, Jo') // '"Smith, Jo"'
 */
export function csvCell(value: unknown): string {
  let s = value === null || value === undefined ? '' : String(value);
  if (/^[=+\-@\t\r]/.test(s)) s = `'${s}`;
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export const csvLine = (cells: readonly unknown[]) => cells.map(csvCell).join(',');

/** A whole file: header and rows, CRLF line ends. */
export const csvText = (header: readonly string[], rows: readonly (readonly unknown[])[]) => [csvLine(header), ...rows.map(csvLine)].join('\r\n') + '\r\n';
