/**
 * Who gets a place on a workday's crew. A workday has a total cap and optionally a cap per
 * role; without role caps any role may fill the total. Pure: the caller counts under a lock.
 */
import type { CrewRole } from '../../../shared/schemas/crew.schema.js';

export interface CrewCaps {
  total: number;
  /** Empty when the workday has no per-role caps. */
  byRole: Partial<Record<CrewRole, number>>;
}

export interface CrewCounts {
  total: number;
  byRole: Partial<Record<CrewRole, number>>;
}

/** Whether the workday's roles are capped one by one (otherwise any role within the total). */
export const hasRoleCaps = (caps: CrewCaps) => Object.keys(caps.byRole).length > 0;

/** Whether a role takes sign-ups at all on this workday. */
export function roleOffered(caps: CrewCaps, role: CrewRole): boolean {
  return !hasRoleCaps(caps) || (caps.byRole[role] ?? 0) > 0;
}

/** Whether one more confirmed person in `role` fits. */
export function hasRoom(caps: CrewCaps, counts: CrewCounts, role: CrewRole): boolean {
  if (counts.total >= caps.total) return false;
  if (!hasRoleCaps(caps)) return true;
  return (counts.byRole[role] ?? 0) < (caps.byRole[role] ?? 0);
}

export interface WaitingPerson {
  id: string;
  role: CrewRole;
}

/**
 * Who moves up from the waitlist, in line order (oldest first): each person whose role has
 * room, until the crew is full. Someone whose role is still full keeps their place in line.
 * @example promotions(caps, counts, [{ id: 'a', role: 'seat' }]) // ['a'] if a seat is free
 */
export function promotions(caps: CrewCaps, counts: CrewCounts, line: readonly WaitingPerson[]): string[] {
  const total = { ...counts, byRole: { ...counts.byRole } };
  const promoted: string[] = [];
  for (const person of line) {
    if (total.total >= caps.total) break;
    if (!hasRoom(caps, total, person.role)) continue;
    promoted.push(person.id);
    total.total += 1;
    total.byRole[person.role] = (total.byRole[person.role] ?? 0) + 1;
  }
  return promoted;
}
