/**
 * The `?redirect=` target after sign-in, only when it is a path inside this site
 * (so a crafted link cannot send someone elsewhere after they sign in).
 */
export function safeRedirect(value: unknown): string | null {
  if (typeof value !== 'string') return null;
  if (!value.startsWith('/') || value.startsWith('//') || value.startsWith('/\\')) return null;
  return value;
}
