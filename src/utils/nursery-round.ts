import type { MeasurementRoundBody, TreeRow } from '@shared/schemas/nursery.schema';
import { numberOrUndefined } from './nursery';

/** One tree's line in a measurement round, as typed. */
export interface RoundRow {
  tree: TreeRow;
  height: string;
  leaves: string;
  healthy: boolean;
  note: string;
}

export type RoundEntry = MeasurementRoundBody['measurements'][number];

/**
 * What one row sends: null when nothing was typed (the tree is skipped), a message when a value
 * can't be read, else the measurement. Health goes with any measured row, as seen that day.
 * @example roundEntry({ tree, height: '41.5', leaves: '', healthy: true, note: '' }) // { treeId, heightCm: 41.5, healthy: true }
 */
export function roundEntry(row: RoundRow): RoundEntry | string | null {
  const note = row.note.trim();
  const touched = row.height.trim() !== '' || row.leaves.trim() !== '' || note !== '' || row.healthy !== row.tree.healthy;
  if (!touched) return null;
  const heightCm = numberOrUndefined(row.height);
  const leafCount = numberOrUndefined(row.leaves);
  if (row.height.trim() !== '' && (heightCm === undefined || heightCm < 0 || heightCm > 500)) return 'height must be a number of cm from 0 to 500';
  if (row.leaves.trim() !== '' && (leafCount === undefined || !Number.isInteger(leafCount) || leafCount < 0)) return 'leaf count must be a whole number';
  return {
    treeId: row.tree.id,
    ...(heightCm !== undefined && { heightCm }),
    ...(leafCount !== undefined && { leafCount }),
    healthy: row.healthy,
    ...(note && { note: note.slice(0, 500) }),
  };
}
