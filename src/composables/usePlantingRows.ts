import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { TreeStage } from '@shared/schemas/nursery.schema';
import type { PlantingTree } from '@/api/plantings';
import { fromDisplayLength, toDisplayLength } from '@/utils/units';

/** One tree offered on the planting form: ticked to be recorded, with its bed elevation as typed. */
export interface PlantingRow {
  id: string;
  tag: string;
  stage: TreeStage;
  heightCm: number | null;
  /** Reserved for this workday (pre-ticked), or added on the day. */
  reserved: boolean;
  ticked: boolean;
  /** In the organisation's display units, as the person typed it. */
  elevation: string;
  /** What the field was filled with, and the metres behind it (sent unchanged if the text is untouched). */
  suggestedText: string;
  suggestedM: number;
}

/** Two decimals in the display units: a hundredth of a foot is about 3 mm, finer than a bed is surveyed. */
export function elevationText(metres: number, units: LengthUnit): string {
  return toDisplayLength(metres, units).toFixed(2);
}

/** A row for a tree of the planting list, or for one added by tag (prefilled with the site's bed elevation). */
export function plantingRow(tree: Pick<PlantingTree, 'id' | 'tag' | 'stage' | 'heightCm' | 'reserved'>, suggestedM: number, units: LengthUnit): PlantingRow {
  const text = elevationText(suggestedM, units);
  return { ...tree, ticked: tree.reserved, elevation: text, suggestedText: text, suggestedM };
}

/**
 * The elevation to send in metres, or an error message. Untouched text sends the stored metres
 * exactly, so converting to feet and back never nudges the site's figure.
 */
export function rowElevationM(row: PlantingRow, units: LengthUnit): { metres: number } | { error: string } {
  const text = row.elevation.trim().replace('\u2212', '-');
  if (text === row.suggestedText) return { metres: row.suggestedM };
  const value = Number(text);
  if (text === '' || !Number.isFinite(value)) return { error: 'Type the bed elevation as a number' };
  return { metres: Math.round(fromDisplayLength(value, units) * 1000) / 1000 };
}

/** Stages the server may record as planted when the tree was not reserved (brining and potted need the override). */
export const PLANTABLE: readonly TreeStage[] = ['potted', 'brining', 'ready'];
