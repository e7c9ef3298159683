/** "2025-03-04T10:00:00Z" → "4 Mar 2025"; an unreadable value is shown as given. */
export function shortDate(iso: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}
