/**
 * Survival of planted trees by cohort and by site at monitoring milestones (pure).
 *
 * Rules (every figure in the reports follows them):
 * - A cohort is the trees of one site planted in the same calendar month (`plantedOn`'s
 *   `YYYY-MM`). Milestone dates are still reckoned from each tree's own planting date.
 * - The check that counts for a tree at milestone m is its FIRST check dated inside the
 *   milestone's window: from `toleranceDays` before the milestone date up to the day the next
 *   milestone's window opens (see `milestoneWindow`). Later checks in the same window are
 *   ignored for m, so a figure reflects the tree as first seen at that age.
 * - With no check in the window, a tree whose latest earlier check said `lost` still counts as
 *   checked and not alive (a lost tree stays lost; crews stop visiting it). Otherwise it is
 *   "not checked" at m and stays out of the rate.
 * - `missing` counts as checked and NOT alive: the conservative common practice, since a tree
 *   that cannot be found cannot be shown to survive.
 * - A milestone is reached when its window has opened on or before `asOf`; only checks dated on
 *   or before `asOf` are used.
 * - survivalRate = alive / checked (null when nothing was checked), rounded to 4 decimals.
 *   `reached` and, per site, `reachedShare` (= reached / planted) show how much of the planting
 *   the rate speaks for.
 */
import { DEFAULT_TOLERANCE_DAYS, milestoneMonths, milestoneWindow, monthOf, monthsBetween, type MilestoneWindow } from './milestones.js';

export type Condition = 'alive' | 'lost' | 'missing';

export interface PlantedTree {
  id: string;
  siteId: string;
  plantedOn: string;
}

export interface CheckRecord {
  treeId: string;
  visitedOn: string;
  condition: Condition;
}

export interface SurvivalCell {
  months: number;
  reached: number;
  checked: number;
  alive: number;
  survivalRate: number | null;
}

export interface CohortSurvival {
  siteId: string;
  /** Planting month, `YYYY-MM`. */
  cohort: string;
  planted: number;
  cells: SurvivalCell[];
}

export interface SiteSurvival {
  siteId: string;
  planted: number;
  cells: (SurvivalCell & { reachedShare: number | null })[];
}

export interface SurvivalTable {
  asOf: string;
  toleranceDays: number;
  milestones: number[];
  cohorts: CohortSurvival[];
  sites: SiteSurvival[];
}

type Outcome = 'not-reached' | 'unchecked' | 'alive' | 'not-alive';

const rate = (num: number, den: number) => (den === 0 ? null : Math.round((num / den) * 10_000) / 10_000);

/** One tree's outcome at one milestone, from its checks sorted by date. */
export function outcomeAt(
  tree: PlantedTree, checks: readonly CheckRecord[], months: number, asOf: string, toleranceDays: number,
  w: MilestoneWindow = milestoneWindow(tree.plantedOn, months, toleranceDays),
): Outcome {
  if (w.opensOn > asOf) return 'not-reached';
  const usable = checks.filter((c) => c.visitedOn <= asOf);
  const counted = usable.find((c) => c.visitedOn >= w.opensOn && c.visitedOn < w.closesBefore);
  if (counted) return counted.condition === 'alive' ? 'alive' : 'not-alive';
  const earlier = usable.filter((c) => c.visitedOn < w.opensOn).at(-1);
  return earlier?.condition === 'lost' ? 'not-alive' : 'unchecked';
}

function cell(months: number, outcomes: Outcome[]): SurvivalCell {
  const reached = outcomes.filter((o) => o !== 'not-reached').length;
  const alive = outcomes.filter((o) => o === 'alive').length;
  const checked = alive + outcomes.filter((o) => o === 'not-alive').length;
  return { months, reached, checked, alive, survivalRate: rate(alive, checked) };
}

const byKey = <T>(items: readonly T[], key: (t: T) => string) => {
  const groups = new Map<string, T[]>();
  for (const item of items) {
    const k = key(item);
    // push, not spread: copying the group on every item is quadratic in the group's size.
    const group = groups.get(k);
    if (group) group.push(item);
    else groups.set(k, [item]);
  }
  return [...groups.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
};

/**
 * The survival table for the given trees (those planted on or before `asOf`) and their checks.
 * @example survivalTable([{ id: 'a', siteId: 's', plantedOn: '2026-03-10' }], [{ treeId: 'a', visitedOn: '2026-04-08', condition: 'alive' }], { asOf: '2026-05-01' })
 *   // cohorts[0].cells[0] → { months: 1, reached: 1, checked: 1, alive: 1, survivalRate: 1 }
 */
export function survivalTable(trees: readonly PlantedTree[], checks: readonly CheckRecord[], opts: { asOf: string; toleranceDays?: number }): SurvivalTable {
  const toleranceDays = opts.toleranceDays ?? DEFAULT_TOLERANCE_DAYS;
  const planted = trees.filter((t) => t.plantedOn <= opts.asOf);
  const checksOf = new Map<string, CheckRecord[]>();
  for (const c of [...checks].sort((a, b) => (a.visitedOn < b.visitedOn ? -1 : a.visitedOn > b.visitedOn ? 1 : 0))) {
    const own = checksOf.get(c.treeId);
    if (own) own.push(c);
    else checksOf.set(c.treeId, [c]);
  }
  const earliest = planted.reduce<string | null>((min, t) => (min === null || t.plantedOn < min ? t.plantedOn : min), null);
  // A yearly milestone is listed once its window has opened for the earliest tree.
  const milestones = milestoneMonths(earliest ? monthsBetween(earliest, opts.asOf) + 1 : 0)
    .filter((m, i) => i < 4 || (earliest !== null && milestoneWindow(earliest, m, toleranceDays).opensOn <= opts.asOf));
  // Trees share a handful of planting dates; the date arithmetic of a window is the costly part.
  const windows = new Map<string, MilestoneWindow>();
  const windowOf = (plantedOn: string, m: number) => {
    const key = `${plantedOn}|${m}`;
    let w = windows.get(key);
    if (!w) windows.set(key, (w = milestoneWindow(plantedOn, m, toleranceDays)));
    return w;
  };
  const outcomes = new Map(planted.map((t) => [t.id, milestones.map((m) => outcomeAt(t, checksOf.get(t.id) ?? [], m, opts.asOf, toleranceDays, windowOf(t.plantedOn, m)))]));
  const cellsFor = (group: readonly PlantedTree[]) => milestones.map((m, i) => cell(m, group.map((t) => outcomes.get(t.id)![i]!)));

  const cohorts = byKey(planted, (t) => `${t.siteId}|${monthOf(t.plantedOn)}`).map(([key, group]) => ({
    siteId: group[0]!.siteId, cohort: key.split('|')[1]!, planted: group.length, cells: cellsFor(group),
  }));
  const sites = byKey(planted, (t) => t.siteId).map(([siteId, group]) => ({
    siteId, planted: group.length, cells: cellsFor(group).map((c) => ({ ...c, reachedShare: rate(c.reached, group.length) })),
  }));
  return { asOf: opts.asOf, toleranceDays, milestones, cohorts, sites };
}
