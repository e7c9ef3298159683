import { describe, expect, it } from 'vitest';
import { monitoringDue, type MonitoredTree } from '../../../server/domain/outcomes/monitoring-due.js';

// Planted 2026-03-10: 1-month check due 2026-04-10 (window 03-27 … 04-24 before it is late),
// 3-month check due 2026-06-10 (its window opens 05-27).
const tree = (id: string, lost = false): MonitoredTree => ({ id, siteId: 's', plantedOn: '2026-03-10', lost });
const trees = [tree('a'), tree('b'), tree('c', true)];

describe('monitoringDue', () => {
  it('says nothing before the first window opens', () => {
    expect(monitoringDue(trees, [], '2026-03-26')).toEqual([]);
  });

  it('is due inside the tolerance window, for the trees not lost', () => {
    expect(monitoringDue(trees, [], '2026-04-05')).toEqual([
      { siteId: 's', plantedOn: '2026-03-10', months: 1, dueOn: '2026-04-10', lateAfter: '2026-04-24', status: 'due', trees: 2, checked: 0 },
    ]);
  });

  it('is overdue after the window until the next milestone opens, counting checks made', () => {
    const checks = [{ treeId: 'a', visitedOn: '2026-04-30', condition: 'alive' as const }];
    expect(monitoringDue(trees, checks, '2026-05-10')).toEqual([expect.objectContaining({ months: 1, status: 'overdue', trees: 2, checked: 1 })]);
  });

  it('drops a cohort once every tree has its check, and moves on to the next milestone', () => {
    const checks = [{ treeId: 'a', visitedOn: '2026-04-09', condition: 'alive' as const }, { treeId: 'b', visitedOn: '2026-04-09', condition: 'lost' as const }];
    expect(monitoringDue(trees, checks, '2026-04-20')).toEqual([]);
    // b was found lost, so only a needs the 3-month check.
    expect(monitoringDue(trees, checks, '2026-06-01')).toEqual([expect.objectContaining({ months: 3, dueOn: '2026-06-10', status: 'due', trees: 1, checked: 0 })]);
  });

  it('puts overdue cohorts first', () => {
    const later = { id: 'z', siteId: 's2', plantedOn: '2026-04-20', lost: false };
    const due = monitoringDue([...trees, later], [], '2026-05-12');
    expect(due.map((d) => [d.siteId, d.status])).toEqual([['s', 'overdue'], ['s2', 'due']]);
  });
});
