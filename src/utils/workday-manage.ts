import { CREW_ROLE_LABELS } from '@shared/schemas/crew.schema';
import type { WorkdayDto, WorkdayStatus } from '@shared/schemas/workday.schema';
import { formatDateKey, formatLocalRange, localDateKey } from './zoned-time';

const STATUS_LABELS: Record<WorkdayStatus, string> = {
  draft: 'Draft',
  published: 'Published',
  cancelled: 'Cancelled',
  completed: 'Completed',
};

export function workdayStatusLabel(status: WorkdayStatus): string {
  return STATUS_LABELS[status];
}

/** Element Plus tag type per status; danger (coral) only for cancellations. */
export function workdayStatusTag(status: WorkdayStatus): 'info' | 'success' | 'danger' | 'primary' {
  if (status === 'published') return 'success';
  if (status === 'cancelled') return 'danger';
  if (status === 'completed') return 'primary';
  return 'info';
}

/**
 * The day and hours on the site's clock.
 * @example workdayWhen(w) // 'Tue 4 Mar 2025, 06:40–09:10 EST'
 */
export function workdayWhen(w: Pick<WorkdayDto, 'startsAt' | 'endsAt' | 'site'>): string {
  const tz = w.site.timeZone;
  return `${formatDateKey(localDateKey(w.startsAt, tz), { year: true })}, ${formatLocalRange(w.startsAt, w.endsAt, tz)}`;
}

/** One fill bar: places taken out of a cap, and how many wait in line. */
export interface FillRow {
  key: string;
  label: string;
  capacity: number;
  confirmed: number;
  waitlisted: number;
  /** Without role caps: who has signed up for what, e.g. 'Planter 4 · Shore crew 2'. */
  detail?: string;
}

/** A bar per offered role when roles are capped; otherwise one bar for the whole crew, with the roles listed. */
export function fillRows(w: WorkdayDto): FillRow[] {
  if (w.roleCapped) {
    return w.roles
      .filter((r) => r.capacity > 0 || r.confirmed > 0 || r.waitlisted > 0)
      .map((r) => ({ key: r.role, label: CREW_ROLE_LABELS[r.role], capacity: r.capacity, confirmed: r.confirmed, waitlisted: r.waitlisted }));
  }
  const taken = w.roles.filter((r) => r.confirmed > 0).map((r) => `${CREW_ROLE_LABELS[r.role]} ${r.confirmed}`);
  return [{ key: 'all', label: 'Whole crew', capacity: w.capacity, confirmed: w.confirmed, waitlisted: w.waitlisted, detail: taken.join(' · ') || undefined }];
}

/** '7 of 12 places taken · 2 waiting'. */
export function fillText(row: Pick<FillRow, 'capacity' | 'confirmed' | 'waitlisted'>): string {
  const base = `${row.confirmed} of ${row.capacity} ${row.capacity === 1 ? 'place' : 'places'} taken`;
  return row.waitlisted > 0 ? `${base} · ${row.waitlisted} waiting` : base;
}

export function hasEnded(w: Pick<WorkdayDto, 'endsAt'>, now: Date): boolean {
  return Date.parse(w.endsAt) <= now.getTime();
}

/** 200 → '3 h 20 min'; 45 → '45 min'; 0 → '0 min'. */
export function formatMinutes(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}
