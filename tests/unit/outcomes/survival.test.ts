import { describe, expect, it } from 'vitest';
import { survivalTable, type CheckRecord, type PlantedTree } from '../../../server/domain/outcomes/survival.js';

/*
 * Hand-built site "s" (all figures worked by hand below):
 * March cohort, planted 2026-03-10: a, b, c, d. 1-month window 2026-03-27 … 2026-05-26,
 *   3-month window 2026-05-27 … 2026-08-26 (6-month opens 2026-08-27).
 * May cohort, planted 2026-05-20: e, f. 1-month window opens 2026-06-06; 3-month opens 2026-08-06.
 * Visits: 2026-04-08 (a alive, b alive, c lost, d missing), 2026-04-20 (a lost: a later check in
 *   the same window, ignored for 1 month), 2026-06-12 (a alive, b lost, d alive, e alive).
 * As of 2026-07-01:
 *   March, 1 month: reached 4, checked 4 (a, b, c, d), alive 2 (a, b) → 2/4 = 0.5
 *     (d missing counts as checked, not alive).
 *   March, 3 months: reached 4; a alive, b lost, d alive at 06-12; c has no check but was lost
 *     at 04-08, so it stays lost → checked 4, alive 2 → 0.5.
 *   March, 6 months: window opens 08-27, after 07-01 → reached 0.
 *   May, 1 month: reached 2, checked 1 (e; f never checked), alive 1 → 1.
 *   Site, 1 month: reached 6, checked 5, alive 3 → 0.6; reachedShare 6/6 = 1.
 *   Site, 3 months: reached 4 (May's 3-month window opens 08-06), checked 4, alive 2 → 0.5;
 *     reachedShare 4/6 = 0.6667.
 */
const trees: PlantedTree[] = [
  ...['a', 'b', 'c', 'd'].map((id) => ({ id, siteId: 's', plantedOn: '2026-03-10' })),
  ...['e', 'f'].map((id) => ({ id, siteId: 's', plantedOn: '2026-05-20' })),
];
const check = (treeId: string, visitedOn: string, condition: CheckRecord['condition']): CheckRecord => ({ treeId, visitedOn, condition });
const checks: CheckRecord[] = [
  check('a', '2026-06-12', 'alive'), check('b', '2026-06-12', 'lost'), check('d', '2026-06-12', 'alive'), check('e', '2026-06-12', 'alive'),
  check('a', '2026-04-08', 'alive'), check('b', '2026-04-08', 'alive'), check('c', '2026-04-08', 'lost'), check('d', '2026-04-08', 'missing'),
  check('a', '2026-04-20', 'lost'),
];

describe('survivalTable', () => {
  const table = survivalTable(trees, checks, { asOf: '2026-07-01' });

  it('groups cohorts by site and planting month and lists the first year\'s milestones', () => {
    expect(table.milestones).toEqual([1, 3, 6, 12]);
    expect(table.cohorts.map((c) => [c.cohort, c.planted])).toEqual([['2026-03', 4], ['2026-05', 2]]);
  });

  it('matches the worked figures for each cohort', () => {
    const [march, may] = table.cohorts;
    expect(march!.cells.slice(0, 3)).toEqual([
      { months: 1, reached: 4, checked: 4, alive: 2, survivalRate: 0.5 },
      { months: 3, reached: 4, checked: 4, alive: 2, survivalRate: 0.5 },
      { months: 6, reached: 0, checked: 0, alive: 0, survivalRate: null },
    ]);
    expect(may!.cells[0]).toEqual({ months: 1, reached: 2, checked: 1, alive: 1, survivalRate: 1 });
    expect(may!.cells[1]).toMatchObject({ reached: 0, checked: 0 });
  });

  it('matches the worked figures for the site, with the share of trees reaching each check', () => {
    const site = table.sites[0]!;
    expect(site.planted).toBe(6);
    expect(site.cells[0]).toEqual({ months: 1, reached: 6, checked: 5, alive: 3, survivalRate: 0.6, reachedShare: 1 });
    expect(site.cells[1]).toEqual({ months: 3, reached: 4, checked: 4, alive: 2, survivalRate: 0.5, reachedShare: 0.6667 });
  });

  it('ignores checks after the as-of date and trees planted after it', () => {
    const early = survivalTable(trees, checks, { asOf: '2026-05-01' });
    expect(early.cohorts.map((c) => c.cohort)).toEqual(['2026-03']);
    expect(early.cohorts[0]!.cells[0]).toEqual({ months: 1, reached: 4, checked: 4, alive: 2, survivalRate: 0.5 });
    expect(early.cohorts[0]!.cells[1]).toMatchObject({ reached: 0 });
  });

  it('adds yearly milestones once their window has opened', () => {
    const later = survivalTable(trees, checks, { asOf: '2028-03-01' });
    expect(later.milestones).toEqual([1, 3, 6, 12, 24]);
    // The March cohort's 24-month window opens 2028-02-25 and nobody visited: b (lost 06-12) and
    // c (lost 04-08) stay lost, a and d were last seen alive so they are not checked → 0 of 2.
    const march24 = later.cohorts[0]!.cells[4]!;
    expect(march24).toEqual({ months: 24, reached: 4, checked: 2, alive: 0, survivalRate: 0 });
  });

  it('answers an empty table when nothing was planted', () => {
    expect(survivalTable([], [], { asOf: '2026-07-01' })).toEqual({ asOf: '2026-07-01', toleranceDays: 14, milestones: [1, 3, 6, 12], cohorts: [], sites: [] });
  });
});
