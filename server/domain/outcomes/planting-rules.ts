/**
 * Which trees a planting workday may record as planted (pure).
 *
 * - A tree already planted by this workday is left as it is (recording twice changes nothing).
 * - A tree planted by another day, or lost, is refused (409 conflict).
 * - A tree reserved for another workday is refused (409): it is promised elsewhere.
 * - A tree reserved for this workday may be planted from `brining` or `ready` (reserving
 *   already checked its stage).
 * - An unreserved `ready` tree may be planted: plans change on the day.
 * - `brining` or `potted` trees that were not reserved need `allowUnready: true`, the
 *   coordinator's explicit word that they went out before the nursery called them ready.
 * - `collected` and `tube` trees are refused (400): they have no grow-out pot to stand in.
 */
import type { TreeStage } from '../../../shared/schemas/nursery.schema.js';

export interface PlantingCandidate {
  tag: string;
  stage: TreeStage;
  reservedWorkdayId: string | null;
  plantedWorkdayId: string | null;
}

export type PlantingDecision =
  | { kind: 'plant' }
  | { kind: 'already' }
  | { kind: 'refuse'; status: 400 | 409; problem: string };

const OUT: readonly TreeStage[] = ['planted', 'alive', 'lost'];
const RESERVED_OK: readonly TreeStage[] = ['brining', 'ready'];
const NEEDS_OVERRIDE: readonly TreeStage[] = ['brining', 'potted'];

/**
 * @example plantingDecision({ tag: 'T-0001', stage: 'potted', reservedWorkdayId: null, plantedWorkdayId: null }, 'w1', false)
 *   // { kind: 'refuse', status: 400, problem: 'T-0001 is potted and not reserved for this workday; set allowUnready to record it anyway' }
 */
export function plantingDecision(tree: PlantingCandidate, workdayId: string, allowUnready: boolean): PlantingDecision {
  const refuse = (status: 400 | 409, problem: string): PlantingDecision => ({ kind: 'refuse', status, problem: `${tree.tag} ${problem}` });
  if (tree.plantedWorkdayId === workdayId && OUT.includes(tree.stage)) return { kind: 'already' };
  if (tree.stage === 'lost') return refuse(409, 'is recorded lost');
  if (OUT.includes(tree.stage)) return refuse(409, `is already ${tree.stage} (recorded on another day)`);
  if (tree.reservedWorkdayId !== null && tree.reservedWorkdayId !== workdayId) return refuse(409, 'is reserved for another workday');
  if (tree.reservedWorkdayId === workdayId && RESERVED_OK.includes(tree.stage)) return { kind: 'plant' };
  if (tree.stage === 'ready') return { kind: 'plant' };
  if (NEEDS_OVERRIDE.includes(tree.stage)) {
    return allowUnready ? { kind: 'plant' } : refuse(400, `is ${tree.stage} and not reserved for this workday; set allowUnready to record it anyway`);
  }
  return refuse(400, `is ${tree.stage}; only potted trees can be planted`);
}

/** The problems of refused trees, and the status to answer with (409 when any conflicts, else 400). */
export function refusals(decisions: readonly PlantingDecision[]): { status: 400 | 409; problems: string[] } | null {
  const refused = decisions.flatMap((d) => (d.kind === 'refuse' ? [d] : []));
  if (refused.length === 0) return null;
  return { status: refused.some((d) => d.status === 409) ? 409 : 400, problems: refused.map((d) => d.problem) };
}
