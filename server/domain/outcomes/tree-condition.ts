/**
 * A planted tree's stage follows its monitoring checks (pure).
 *
 * The latest check that saw the tree decides: `alive` → stage `alive`, `lost` → stage `lost`.
 * A `missing` check keeps the stage as it was (the tree may turn up at the next visit), but
 * survival figures count it as not alive — conservative common practice. "Latest" is by visit
 * date, then by when the check was recorded.
 */
import type { TreeStage } from '../../../shared/schemas/nursery.schema.js';
import type { Condition } from './survival.js';

export interface DatedCheck {
  visitedOn: string;
  recordedAt: number;
  condition: Condition;
}

const later = (a: DatedCheck, b: DatedCheck) => (a.visitedOn !== b.visitedOn ? a.visitedOn > b.visitedOn : a.recordedAt > b.recordedAt);

/** The latest of the checks (undefined when there are none). */
export function latestCheck<T extends DatedCheck>(checks: readonly T[]): T | undefined {
  return checks.reduce<T | undefined>((best, c) => (best === undefined || later(c, best) ? c : best), undefined);
}

/**
 * The stage a planted tree should have after its checks. With no check that saw the tree,
 * `alive` (which only a check can give) falls back to `planted`; other stages stay.
 * @example stageAfterChecks('planted', [{ visitedOn: '2026-04-08', recordedAt: 0, condition: 'lost' }]) // 'lost'
 */
export function stageAfterChecks(current: TreeStage, checks: readonly DatedCheck[]): TreeStage {
  const seen = latestCheck(checks.filter((c) => c.condition !== 'missing'));
  if (seen) return seen.condition === 'alive' ? 'alive' : 'lost';
  return current === 'alive' ? 'planted' : current;
}

/**
 * Whether a planted tree counts as alive in the summary figures: its latest check (if any)
 * neither `lost` nor `missing`. A tree not yet checked counts as alive (nothing says otherwise)
 * unless it was marked lost in the nursery ledger without any check (`lostWithoutCheck`).
 */
export const countsAlive = (t: { lostWithoutCheck: boolean; latest: Condition | null }) => (t.latest === null ? !t.lostWithoutCheck : t.latest === 'alive');
