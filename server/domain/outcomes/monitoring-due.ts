/**
 * Which planting cohorts need a monitoring visit (pure). Here a cohort is the trees of one site
 * planted on the same date (one planting day), because a visit is planned for a date.
 *
 * For each cohort, the milestone whose window opened last (see `milestoneWindow`) is the one
 * that matters: an older milestone that was missed is superseded once the next window opens.
 * It is due while today is inside [dueOn − tolerance, dueOn + tolerance] and overdue after
 * that, as long as some of the cohort's trees still lack a check in the window. Trees already
 * lost before the window opened need no visit.
 */
import { DEFAULT_TOLERANCE_DAYS, addDays, milestoneMonths, milestoneWindow, monthsBetween, type MilestoneWindow } from './milestones.js';
import type { CheckRecord, PlantedTree } from './survival.js';

export interface MonitoredTree extends PlantedTree {
  /** The tree's stage is `lost` (from a check or from the nursery ledger). */
  lost: boolean;
}

export interface DueCohort {
  siteId: string;
  plantedOn: string;
  months: number;
  dueOn: string;
  /** Last day of the tolerance window; after it the check is overdue. */
  lateAfter: string;
  status: 'due' | 'overdue';
  /** Trees that need this check (not lost before the window opened). */
  trees: number;
  /** Of those, checked in the window already. */
  checked: number;
}

function latestOpened(plantedOn: string, today: string, toleranceDays: number): MilestoneWindow | undefined {
  return milestoneMonths(monthsBetween(plantedOn, today) + 1)
    .map((m) => milestoneWindow(plantedOn, m, toleranceDays))
    .filter((w) => w.opensOn <= today)
    .at(-1);
}

function cohortDue(group: readonly MonitoredTree[], checks: ReadonlyMap<string, CheckRecord[]>, today: string, toleranceDays: number): DueCohort | null {
  const first = group[0]!;
  const w = latestOpened(first.plantedOn, today, toleranceDays);
  if (!w) return null;
  const inWindow = (c: CheckRecord) => c.visitedOn >= w.opensOn && c.visitedOn < w.closesBefore;
  const needed = group.filter((t) => {
    const own = checks.get(t.id) ?? [];
    if (own.some(inWindow)) return true;
    const earlier = own.filter((c) => c.visitedOn < w.opensOn).at(-1);
    return !t.lost && earlier?.condition !== 'lost';
  });
  const checked = needed.filter((t) => (checks.get(t.id) ?? []).some(inWindow)).length;
  if (needed.length === 0 || checked === needed.length) return null;
  const lateAfter = addDays(w.dueOn, toleranceDays);
  return { siteId: first.siteId, plantedOn: first.plantedOn, months: w.months, dueOn: w.dueOn, lateAfter, status: today > lateAfter ? 'overdue' : 'due', trees: needed.length, checked };
}

/**
 * Cohorts with a check due or overdue on `today`, most urgent first (overdue, then by date).
 * @example monitoringDue([{ id: 'a', siteId: 's', plantedOn: '2026-03-10', lost: false }], [], '2026-04-05')
 *   // [{ siteId: 's', plantedOn: '2026-03-10', months: 1, dueOn: '2026-04-10', lateAfter: '2026-04-24', status: 'due', trees: 1, checked: 0 }]
 */
export function monitoringDue(trees: readonly MonitoredTree[], checks: readonly CheckRecord[], today: string, toleranceDays = DEFAULT_TOLERANCE_DAYS): DueCohort[] {
  const checksOf = new Map<string, CheckRecord[]>();
  // push, not spread: copying a list on every item is quadratic at thousands of trees.
  for (const c of [...checks].sort((a, b) => (a.visitedOn < b.visitedOn ? -1 : 1))) {
    const own = checksOf.get(c.treeId);
    if (own) own.push(c);
    else checksOf.set(c.treeId, [c]);
  }
  const groups = new Map<string, MonitoredTree[]>();
  for (const t of trees) {
    if (t.plantedOn > today) continue;
    const key = `${t.siteId}|${t.plantedOn}`;
    const group = groups.get(key);
    if (group) group.push(t);
    else groups.set(key, [t]);
  }
  const due = [...groups.values()].flatMap((g) => cohortDue(g, checksOf, today, toleranceDays) ?? []);
  return due.sort((a, b) => (a.status !== b.status ? (a.status === 'overdue' ? -1 : 1) : a.dueOn < b.dueOn ? -1 : a.dueOn > b.dueOn ? 1 : 0));
}
