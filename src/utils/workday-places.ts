import { CREW_ROLE_LABELS, type CrewRole } from '@shared/schemas/crew.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';

/** What the places part of a workday needs; WorkdayDto has it all. */
export type WorkdayPlacesSource = Pick<WorkdayDto, 'capacity' | 'confirmed' | 'waitlisted' | 'roles' | 'roleCapped' | 'status' | 'startsAt'>;

export interface RolePlaces {
  role: CrewRole;
  label: string;
  capacity: number;
  confirmed: number;
  waitlisted: number;
  /** Places a new sign-up in this role would still get; 0 means they join the waitlist. */
  left: number;
}

/** Places still open on the whole crew. */
export function crewPlacesLeft(w: WorkdayPlacesSource): number {
  return Math.max(0, w.capacity - w.confirmed);
}

/**
 * Places open for one role. With per-role caps both the role's cap and the crew's total limit it;
 * without them any role fills the total (the server's rule, server/domain/crew/places.ts).
 */
export function rolePlacesLeft(w: WorkdayPlacesSource, role: CrewRole): number {
  const total = crewPlacesLeft(w);
  if (!w.roleCapped) return total;
  const row = w.roles.find((r) => r.role === role);
  return row ? Math.min(total, Math.max(0, row.capacity - row.confirmed)) : 0;
}

/** The roles a volunteer can sign up for (capacity above 0), with places left in each. */
export function offeredRoles(w: WorkdayPlacesSource): RolePlaces[] {
  return w.roles
    .filter((r) => r.capacity > 0)
    .map((r) => ({ ...r, label: CREW_ROLE_LABELS[r.role], left: rolePlacesLeft(w, r.role) }));
}

/** Whether sign-up is open: published and not yet started. */
export function isOpenForSignup(w: Pick<WorkdayDto, 'status' | 'startsAt'>, now: number): boolean {
  return w.status === 'published' && Date.parse(w.startsAt) > now;
}

/** Places open in any role: the crew's total, or less when the roles with room have fewer. */
export function openPlaces(w: WorkdayPlacesSource): number {
  if (!w.roleCapped) return crewPlacesLeft(w);
  return Math.min(crewPlacesLeft(w), offeredRoles(w).reduce((sum, r) => sum + r.left, 0));
}

/** Whether anyone signing up now would get a place in some role. */
export function hasPlacesLeft(w: WorkdayPlacesSource): boolean {
  return openPlaces(w) > 0;
}

/** @example placesText(1) // '1 place left'; placesText(0) // 'Full: waitlist open' */
export function placesText(left: number): string {
  if (left <= 0) return 'Full: waitlist open';
  return `${left} ${left === 1 ? 'place' : 'places'} left`;
}

/** @example waitingText(2) // '2 on the waitlist' */
export function waitingText(count: number): string {
  return count === 0 ? 'nobody waiting' : `${count} on the waitlist`;
}

export function crewRoleLabel(role: CrewRole): string {
  return CREW_ROLE_LABELS[role];
}

/** @example availabilityText(w) // '4 places left', 'Full: waitlist open', 'Cancelled' or 'Completed' */
export function availabilityText(w: WorkdayPlacesSource): string {
  if (w.status === 'cancelled') return 'Cancelled';
  if (w.status === 'completed') return 'Completed';
  return placesText(openPlaces(w));
}
