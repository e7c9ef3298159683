import { z } from 'zod';

/**
 * Field builders shared by the nursery schema files (trees, batches, tanks, readiness). Not
 * re-exported from nursery.schema.ts: they are building blocks, not request or response shapes.
 */
export const id = (what: string) => z.string().uuid({ message: `must be a ${what} id` });
export const IsoDate = z.iso.date({ message: 'must be a date YYYY-MM-DD' });
export const Instant = z.iso.datetime({ offset: true, message: 'must be an ISO date-time' });
export const num = (min: number, max: number, unit = '') =>
  z.number({ message: 'must be a number' }).min(min, { message: `must be at least ${min}${unit}` }).max(max, { message: `must be at most ${max}${unit}` });
export const unique = (ids: readonly string[]) => new Set(ids).size === ids.length;
export const TreeIds = z.array(id('tree')).min(1, { message: 'pick at least one tree' }).max(500, { message: 'at most 500 trees at once' }).refine(unique, { message: 'each tree at most once' });
/** `a,b,c` (or a repeated query parameter) as a list. */
export const listParam = (v: unknown) => (Array.isArray(v) ? v.flatMap((x) => String(x).split(',')) : typeof v === 'string' ? v.split(',') : v);
/** True when at least one of `keys` is given. */
export const anyOf = (keys: string[]) => (b: object) => Object.entries(b).some(([k, v]) => keys.includes(k) && v !== undefined);

export const Named = z.object({ id: z.string(), name: z.string() });
export const nil = <T extends z.ZodType>(s: T) => s.nullable();
/** A reason, caution or warning: a stable code and a sentence for people. */
export const Warning = z.object({ code: z.string(), message: z.string() });
