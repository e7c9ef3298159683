import { describe, expect, it } from 'vitest';
import type { DayCapacity } from '@shared/schemas/trip-capacity.schema';
import { capacitySentence, capacityTiming } from '@/utils/day-capacity';
import { applyRoleNeeds, emptyWorkdayForm, roleCapsBody } from '@/utils/workday-form';

const cap = (overrides: Partial<DayCapacity> = {}): DayCapacity => ({
  window: { start: '2025-07-10T13:30:00.000Z', end: '2025-07-10T16:00:00.000Z' },
  trees: 118,
  transportPots: 130,
  plantingTrees: 118,
  skippers: 15,
  planters: 21,
  roles: { 'own-kayak': 3, seat: 10, operator: 2, shore: 2, planter: 21 },
  runs: 28,
  lastLandingAt: '2025-07-10T15:05:00.000Z',
  craftUsed: Array.from({ length: 15 }, (_, i) => `c${i}`),
  notes: [],
  ...overrides,
});

describe('the day-capacity sentence', () => {
  it('names every role needed, in the order a coordinator fills them', () => {
    expect(capacitySentence(cap())).toBe(
      'This day can plant about 118 trees and needs 2 boat operators, 10 paddlers needing a seat, 3 paddlers with their own kayaks, 21 planters and 2 on the shore crew.',
    );
  });

  it('uses the singular for one and leaves out roles not needed', () => {
    const one = cap({ trees: 1, roles: { 'own-kayak': 1, seat: 0, operator: 1, shore: 0, planter: 1 } });
    expect(capacitySentence(one)).toBe('This day can plant about 1 tree and needs 1 boat operator, 1 paddler with their own kayak and 1 planter.');
  });

  it('says plainly when nothing can be planted', () => {
    expect(capacitySentence(cap({ trees: 0 }))).toBe('This day cannot plant any trees with the active fleet in this window.');
  });

  it("gives the last landing on the site's clock", () => {
    // 15:05 UTC is 11:05 in New York in July (EDT, UTC−4) and 08:05 in Los Angeles (PDT, UTC−7).
    expect(capacityTiming(cap(), 'America/New_York')).toBe('The last pot lands at about 11:05, in 28 runs across 15 craft.');
    expect(capacityTiming(cap({ runs: 1, craftUsed: ['c1'] }), 'America/Los_Angeles')).toBe('The last pot lands at about 08:05, in 1 run across 1 craft.');
    expect(capacityTiming(cap({ lastLandingAt: null }), 'UTC')).toBe('');
  });
});

describe('applyRoleNeeds', () => {
  it('turns on role caps at the needs, leaves unneeded roles empty and sets the total to their sum', () => {
    const form = emptyWorkdayForm({}, 'UTC');
    form.roleCaps['own-kayak'] = '4';
    applyRoleNeeds(form, { 'own-kayak': 0, seat: 10, operator: 2, shore: 2, planter: 21 });
    expect(form.capEachRole).toBe(true);
    expect(form.roleCaps).toEqual({ 'own-kayak': '', seat: '10', operator: '2', shore: '2', planter: '21' });
    expect(form.capacity).toBe('35');
    expect(roleCapsBody(form)).toEqual([
      { role: 'seat', capacity: 10 },
      { role: 'operator', capacity: 2 },
      { role: 'shore', capacity: 2 },
      { role: 'planter', capacity: 21 },
    ]);
  });
});
