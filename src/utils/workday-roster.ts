import { CREW_ROLE_LABELS, CrewRole, type SignupStatus } from '@shared/schemas/crew.schema';
import type { RosterRow } from '@shared/schemas/roster.schema';
import { craftKindLabel } from './crew-labels';
import { fromKilograms, type WeightUnit } from './weight';
import { formatMinutes } from './workday-manage';
import { formatLocalTime } from './zoned-time';

export interface RosterFilters {
  role: CrewRole | '';
  status: Exclude<SignupStatus, 'cancelled'> | '';
  search: string;
}

/** Lower case without accents, so "jose" finds "José". */
function folded(text: string): string {
  return text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase();
}

export function filterRoster(rows: RosterRow[], filters: RosterFilters): RosterRow[] {
  const q = folded(filters.search.trim());
  return rows.filter(
    (r) => (!filters.role || r.role === filters.role) && (!filters.status || r.status === filters.status) && (!q || folded(r.name).includes(q)),
  );
}

export interface RosterGroup {
  key: string;
  heading: string;
  rows: RosterRow[];
}

/** Confirmed crew by role (in the usual role order), then one waitlist in line order as the server sent it. */
export function groupRoster(rows: RosterRow[]): RosterGroup[] {
  const groups: RosterGroup[] = CrewRole.options
    .map((role) => ({ key: role, heading: CREW_ROLE_LABELS[role], rows: rows.filter((r) => r.status === 'confirmed' && r.role === role) }))
    .filter((g) => g.rows.length > 0);
  const waiting = rows.filter((r) => r.status === 'waitlisted');
  if (waiting.length > 0) groups.push({ key: 'waitlist', heading: 'Waitlist', rows: waiting });
  return groups;
}

export type FlagTone = 'success' | 'warning' | 'info';

export interface RosterFlag {
  key: string;
  text: string;
  tone: FlagTone;
}

/** What a coordinator checks before the boats leave: waiver, age and guardian, craft, qualification, e-mail. */
export function rosterFlags(row: RosterRow, weightUnit: WeightUnit): RosterFlag[] {
  const flags: RosterFlag[] = [{ key: 'waiver', text: `Waiver v${row.waiverVersion} signed`, tone: 'success' }];
  if (row.isMinor) flags.push({ key: 'minor', text: `Minor · guardian: ${row.guardianName ?? 'not named'}`, tone: 'warning' });
  if (row.ageNotGiven) flags.push({ key: 'age', text: 'Age not given', tone: 'warning' });
  if (row.ownCraft) {
    const { kind, seats, maxLoadKg } = row.ownCraft;
    const load = `${fromKilograms(maxLoadKg, weightUnit)} ${weightUnit}`;
    flags.push({ key: 'craft', text: `Own craft: ${craftKindLabel(kind)}, ${seats} ${seats === 1 ? 'seat' : 'seats'}, max ${load}`, tone: 'info' });
  }
  if (row.operatorQualification) flags.push({ key: 'operator', text: `Operator: ${row.operatorQualification}`, tone: 'info' });
  if (!row.emailVerified) flags.push({ key: 'email', text: 'E-mail not verified', tone: 'warning' });
  return flags;
}

/** 'Confirmed', or the place in line: 'Waitlist #2'. */
export function rosterStatusText(row: RosterRow): string {
  if (row.status === 'waitlisted') return row.position ? `Waitlist #${row.position}` : 'Waitlist';
  return row.status === 'confirmed' ? 'Confirmed' : 'Cancelled';
}

/** Check-in and check-out on the site's clock, and the minutes credited. */
export function attendanceText(row: RosterRow, timeZone: string): string {
  if (row.noShow) return 'No-show';
  const parts: string[] = [];
  if (row.checkedInAt) parts.push(`In ${formatLocalTime(row.checkedInAt, timeZone)}`);
  if (row.checkedOutAt) parts.push(`out ${formatLocalTime(row.checkedOutAt, timeZone)}`);
  if (row.minutes > 0 || row.minutesOverridden) parts.push(`${formatMinutes(row.minutes)}${row.minutesOverridden ? ' (corrected)' : ''}`);
  return parts.length > 0 ? parts.join(' · ') : 'Not checked in';
}
