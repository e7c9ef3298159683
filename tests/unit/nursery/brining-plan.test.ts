/**
 * Brining plans on hand-built tanks (invented volumes, salinities and dates). The litres are
 * checked against the swap formula x = V·(C1 − C0)/(Cs − C0) (TRADE.md §4) worked by hand, and
 * each step's mass balance is re-checked; step sizes and intervals are the [CP] defaults.
 */
import { describe, expect, it } from 'vitest';
import { briningPlan, BRINING_DEFAULTS } from '../../../server/domain/nursery/brining-plan.js';
import { tasksDueOn } from '../../../server/domain/nursery/brining-tasks.js';
import { NurseryInputError } from '../../../server/domain/nursery/errors.js';

describe('briningPlan going up', () => {
  // Hand-built: a 100 L tank at 10 ppt for a 27 ppt site, 35 ppt stock.
  const plan = briningPlan({ currentPpt: 10, targetPpt: 27, volumeLitres: 100, startDate: '2026-03-01' });

  it('splits 17 ppt into 4 equal steps of 4.25 ppt, one every 4 days from the start', () => {
    expect(plan.steps.map((s) => [s.date, s.fromPpt, s.toPpt, s.stockPpt])).toEqual([
      ['2026-03-01', 10, 14.25, 35],
      ['2026-03-05', 14.25, 18.5, 35],
      ['2026-03-09', 18.5, 22.75, 35],
      ['2026-03-13', 22.75, 27, 35],
    ]);
  });

  it('swaps 100·4.25/(35 − from) litres each time: 17.00, 20.48, 25.76, 34.69 L', () => {
    expect(plan.steps.map((s) => s.replaceLitres)).toEqual([17, 20.48, 25.76, 34.69]);
    for (const s of plan.steps) expect((100 - s.replaceLitres) * s.fromPpt + s.replaceLitres * 35).toBeCloseTo(100 * s.toPpt, 0);
  });

  it('is reached on the last step and ready 21 days later, with no warnings', () => {
    expect(plan.reachedOn).toBe('2026-03-13');
    expect(plan.readyOn).toBe('2026-04-03');
    expect(plan.warnings).toEqual([]);
    expect(plan.latestStartOn).toBeUndefined();
  });

  it('never steps more than maxStepPpt: 10 → 20 at 5 ppt is exactly 2 steps', () => {
    const two = briningPlan({ currentPpt: 10, targetPpt: 20, volumeLitres: 40, startDate: '2026-03-01' });
    expect(two.steps.map((s) => s.toPpt)).toEqual([15, 20]);
  });

  it('uses the [CP] defaults: 35 ppt stock, 5 ppt steps, every 4 days, 21-day hold', () => {
    expect(BRINING_DEFAULTS).toMatchObject({ stockPpt: 35, freshPpt: 0, maxStepPpt: 5, intervalDays: 4, holdDays: 21 });
  });
});

describe('briningPlan going down', () => {
  it('uses fresh water as the swap water: 50 L from 32 to 25 ppt in 2 steps of 3.5 ppt', () => {
    const plan = briningPlan({ currentPpt: 32, targetPpt: 25, volumeLitres: 50, startDate: '2026-05-10', intervalDays: 5 });
    // 50·3.5/32 = 5.469 L, then 50·3.5/28.5 = 6.140 L (hand-worked).
    expect(plan.steps).toEqual([
      { date: '2026-05-10', fromPpt: 32, toPpt: 28.5, replaceLitres: 5.47, stockPpt: 0 },
      { date: '2026-05-15', fromPpt: 28.5, toPpt: 25, replaceLitres: 6.14, stockPpt: 0 },
    ]);
    expect(plan.readyOn).toBe('2026-06-05');
  });

  it('can lower with low-salinity water instead (freshPpt)', () => {
    const plan = briningPlan({ currentPpt: 30, targetPpt: 26, volumeLitres: 50, freshPpt: 10, startDate: '2026-05-10' });
    expect(plan.steps).toEqual([{ date: '2026-05-10', fromPpt: 30, toPpt: 26, replaceLitres: 10, stockPpt: 10 }]);
  });
});

describe('briningPlan edge cases', () => {
  const base = { currentPpt: 10, targetPpt: 27, volumeLitres: 100, startDate: '2026-03-01' };

  it('says "already at target" within the tolerance and only counts the hold', () => {
    const plan = briningPlan({ currentPpt: 31.8, targetPpt: 32, volumeLitres: 80, startDate: '2026-06-01' });
    expect(plan.steps).toEqual([]);
    expect(plan.reachedOn).toBe('2026-06-01');
    expect(plan.readyOn).toBe('2026-06-22');
    expect(plan.warnings).toEqual([
      { code: 'already_at_target', message: 'Already at target: the tank is at 31.8 ppt, within ±0.5 ppt of 32 ppt.' },
    ]);
  });

  it('warns when the workday is too soon, and says the latest start that would have worked', () => {
    const plan = briningPlan({ currentPpt: 10, targetPpt: 27, volumeLitres: 100, startDate: '2026-03-01', by: '2026-03-29' });
    expect(plan.readyOn).toBe('2026-04-03');
    expect(plan.latestStartOn).toBe('2026-02-24');
    expect(plan.warnings).toEqual([{ code: 'workday_too_soon', message: 'The workday is too soon: ready on 2026-04-03, 5 days after it.' }]);
  });

  it('does not warn when ready on the workday itself', () => {
    const plan = briningPlan({ currentPpt: 10, targetPpt: 27, volumeLitres: 100, startDate: '2026-03-01', by: '2026-04-03' });
    expect(plan.warnings).toEqual([]);
    expect(plan.latestStartOn).toBe('2026-03-01');
  });

  it.each([
    [{ targetPpt: 38 }, 'stockPpt', 'Stock water at 35 ppt cannot raise the tank to 38 ppt; use stock of at least 38 ppt.'],
    [{ currentPpt: 30, targetPpt: 5, freshPpt: 10 }, 'freshPpt', 'Water at 10 ppt cannot lower the tank to 5 ppt; use water of at most 5 ppt.'],
  ])('refuses a target the swap water cannot reach (%j)', (overrides, field, message) => {
    const attempt = () => briningPlan({ ...base, ...overrides });
    expect(attempt).toThrow(NurseryInputError);
    expect(attempt).toThrow(message);
    expect(attempt).toThrow(expect.objectContaining({ field }));
  });

  it.each([
    [{ volumeLitres: 0 }, 'volumeLitres'],
    [{ intervalDays: 2.5 }, 'intervalDays'],
    [{ startDate: '2026-02-30' }, 'startDate'],
    [{ by: '29/03/2026' }, 'by'],
    [{ currentPpt: 50 }, 'currentPpt'],
  ])('rejects bad input %j on its field', (overrides, field) => {
    expect(() => briningPlan({ ...base, ...overrides })).toThrow(
      expect.objectContaining({ field }),
    );
  });
});

describe('tasksDueOn', () => {
  // Hand-built: tank B is TRADE.md §4's 5-gallon example (18.93 L, 10 → 15 ppt → swap 3.79 L).
  const b = briningPlan({ currentPpt: 10, targetPpt: 15, volumeLitres: 18.93, startDate: '2026-03-05' });
  const c = briningPlan({ currentPpt: 30, targetPpt: 25, volumeLitres: 40, startDate: '2026-03-01' });
  const d = briningPlan({ currentPpt: 20, targetPpt: 30, volumeLitres: 60, startDate: '2026-03-01' });
  const tanks = [
    { tankName: 'B', steps: b.steps },
    { tankName: 'Bucket 3', steps: c.steps },
    { tankName: 'D', steps: d.steps },
  ];

  it("lists each tank's swap for the day with the line volunteers read", () => {
    expect(tasksDueOn(tanks, '2026-03-05').map((t) => [t.tankName, t.replaceLitres, t.message])).toEqual([
      ['B', 3.79, 'replace 3.8 L in tank B with 35 ppt water'],
      ['D', 30, 'replace 30.0 L in tank D with 35 ppt water'], // 60·5/(35 − 25)
    ]);
  });

  it('names fresh water as such and keeps a name that already says bucket', () => {
    expect(tasksDueOn(tanks, '2026-03-01').map((t) => t.message)).toEqual([
      'replace 6.7 L in Bucket 3 with fresh water', // 40·5/30
      'replace 20.0 L in tank D with 35 ppt water', // 60·5/(35 − 20)
    ]);
  });

  it('is empty on a day without swaps', () => {
    expect(tasksDueOn(tanks, '2026-03-02')).toEqual([]);
  });
});
