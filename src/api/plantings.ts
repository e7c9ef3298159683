import type { z } from 'zod';
import { PlantingList, PlantingResult, type RecordPlantingsBody } from '@shared/schemas/outcomes.schema';
import { del, get, post } from './http';

export type { PlantingList, PlantingResult };
export type { PlantingTree } from '@shared/schemas/outcomes.schema';
/** The body as sent: `allowUnready` may be left out (false on the server). */
export type RecordPlantingsInput = z.input<typeof RecordPlantingsBody>;

const plantingsPath = (workdayId: string) => `/api/workdays/${encodeURIComponent(workdayId)}/plantings`;

/** Coordinators and admins: the trees reserved for a planting workday and those it planted. */
export function fetchPlantings(workdayId: string): Promise<PlantingList> {
  return get(plantingsPath(workdayId), PlantingList);
}

/**
 * Coordinators and admins: records every listed tree as planted, or none (the refused trees are
 * listed in the error's `fields.trees`).
 */
export function recordPlantings(workdayId: string, body: RecordPlantingsInput): Promise<PlantingResult> {
  return post(plantingsPath(workdayId), body, PlantingResult);
}

/** Coordinators and admins: undoes one tree's planting record (409 once it has monitoring checks). */
export async function undoPlanting(workdayId: string, treeId: string): Promise<void> {
  await del(`${plantingsPath(workdayId)}/${encodeURIComponent(treeId)}`);
}
