import type { RosterRow } from '../../shared/schemas/roster.schema.js';
import { csvText } from '../domain/csv.js';

const HEADER = ['Name', 'E-mail', 'Role', 'Status', 'Waitlist position', 'Waiver version', 'Waiver signed', 'Minor', 'Guardian', 'Skills', 'Own craft', 'Emergency contact', 'Emergency phone', 'Checked in', 'Checked out', 'No-show', 'Minutes'];

/** The roster as CSV, for a coordinator's spreadsheet. */
export function rosterCsv(rows: RosterRow[]): string {
  return csvText(HEADER, rows.map((r) => [
    r.name, r.email, r.role, r.status, r.position, r.waiverVersion, r.waiverSignedAt, r.isMinor ? 'yes' : 'no', r.guardianName,
    r.skills.join(' '), r.ownCraft ? `${r.ownCraft.kind} (${r.ownCraft.seats} seat, ${r.ownCraft.maxLoadKg} kg)` : '',
    r.emergencyContact?.name, r.emergencyContact?.phone, r.checkedInAt, r.checkedOutAt, r.noShow ? 'yes' : 'no', r.minutes,
  ]));
}
