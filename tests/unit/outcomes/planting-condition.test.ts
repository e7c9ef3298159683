import { describe, expect, it } from 'vitest';
import { plantingDecision, refusals } from '../../../server/domain/outcomes/planting-rules.js';
import { countsAlive, stageAfterChecks } from '../../../server/domain/outcomes/tree-condition.js';
import type { TreeStage } from '../../../shared/schemas/nursery.schema.js';

const W = 'this-workday';
const tree = (stage: TreeStage, reservedWorkdayId: string | null = null, plantedWorkdayId: string | null = null) => ({ tag: 'T-0001', stage, reservedWorkdayId, plantedWorkdayId });

describe('plantingDecision', () => {
  it.each([
    ['reserved ready', tree('ready', W), false, 'plant'],
    ['reserved brining', tree('brining', W), false, 'plant'],
    ['unreserved ready', tree('ready'), false, 'plant'],
    ['unreserved brining with override', tree('brining'), true, 'plant'],
    ['unreserved potted with override', tree('potted'), true, 'plant'],
    ['already planted by this workday', tree('planted', W, W), false, 'already'],
    ['already checked alive after this workday', tree('alive', null, W), false, 'already'],
  ] as const)('%s → %s', (_name, t, allow, kind) => {
    expect(plantingDecision(t, W, allow).kind).toBe(kind);
  });

  it.each([
    ['unreserved brining without override', tree('brining'), false, 400, 'T-0001 is brining and not reserved for this workday; set allowUnready to record it anyway'],
    ['a tube', tree('tube'), true, 400, 'T-0001 is tube; only potted trees can be planted'],
    ['reserved elsewhere', tree('ready', 'other'), true, 409, 'T-0001 is reserved for another workday'],
    ['planted by another day', tree('planted', null, 'other'), true, 409, 'T-0001 is already planted (recorded on another day)'],
    ['lost', tree('lost'), true, 409, 'T-0001 is recorded lost'],
  ] as const)('refuses %s', (_name, t, allow, status, problem) => {
    expect(plantingDecision(t, W, allow)).toEqual({ kind: 'refuse', status, problem });
  });

  it('answers 409 when any tree conflicts, else 400, naming every refused tree', () => {
    const bad = plantingDecision(tree('tube'), W, false);
    const taken = plantingDecision(tree('ready', 'other'), W, false);
    expect(refusals([{ kind: 'plant' }, bad])).toEqual({ status: 400, problems: ['T-0001 is tube; only potted trees can be planted'] });
    expect(refusals([bad, taken])?.status).toBe(409);
    expect(refusals([{ kind: 'plant' }, { kind: 'already' }])).toBeNull();
  });
});

describe('stage after checks', () => {
  const c = (visitedOn: string, condition: 'alive' | 'lost' | 'missing', recordedAt = 0) => ({ visitedOn, condition, recordedAt });
  it.each([
    ['no checks keeps planted', 'planted', [], 'planted'],
    ['alive', 'planted', [c('2026-04-08', 'alive')], 'alive'],
    ['lost', 'alive', [c('2026-04-08', 'alive'), c('2026-06-12', 'lost')], 'lost'],
    ['missing keeps the stage', 'alive', [c('2026-04-08', 'alive'), c('2026-06-12', 'missing')], 'alive'],
    ['found again after missing', 'planted', [c('2026-04-08', 'missing'), c('2026-06-12', 'alive')], 'alive'],
    ['an older visit recorded later does not win', 'alive', [c('2026-06-12', 'alive', 1), c('2026-04-08', 'lost', 2)], 'alive'],
    ['same visit date: the later record wins', 'planted', [c('2026-06-12', 'alive', 1), c('2026-06-12', 'lost', 2)], 'lost'],
    ['alive without a check that saw it falls back to planted', 'alive', [c('2026-06-12', 'missing')], 'planted'],
  ] as const)('%s', (_name, current, checks, stage) => {
    expect(stageAfterChecks(current, checks)).toBe(stage);
  });

  it('counts missing and lost as not alive, and unchecked trees as alive unless lost in the ledger', () => {
    expect([null, 'alive', 'lost', 'missing'].map((latest) => countsAlive({ latest: latest as never, lostWithoutCheck: false }))).toEqual([true, true, false, false]);
    expect(countsAlive({ latest: null, lostWithoutCheck: true })).toBe(false);
  });
});
