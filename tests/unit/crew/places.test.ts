import { describe, expect, it } from 'vitest';
import { hasRoom, promotions, roleOffered, type CrewCaps } from '../../../server/domain/crew/places.js';

// Hand-built cases: the rules are Ebbroot's own (no outside source applies).
describe('hasRoom', () => {
  const open: CrewCaps = { total: 3, byRole: {} };
  const capped: CrewCaps = { total: 4, byRole: { seat: 1, shore: 3 } };

  it.each([
    [open, { total: 2, byRole: { seat: 2 } }, 'seat', true],
    [open, { total: 3, byRole: { seat: 3 } }, 'planter', false],
    [capped, { total: 1, byRole: { seat: 1 } }, 'seat', false],
    [capped, { total: 1, byRole: { seat: 1 } }, 'shore', true],
    [capped, { total: 4, byRole: { seat: 1, shore: 3 } }, 'shore', false],
  ] as const)('caps %j with counts %j: room for %s is %s', (caps, counts, role, expected) => {
    expect(hasRoom(caps, counts, role)).toBe(expected);
  });

  it('offers only capped roles when roles are capped', () => {
    expect(roleOffered(capped, 'seat')).toBe(true);
    expect(roleOffered(capped, 'planter')).toBe(false);
    expect(roleOffered(open, 'planter')).toBe(true);
  });
});

describe('promotions', () => {
  it('promotes in line order, skipping people whose role is still full, until the crew is full', () => {
    const caps: CrewCaps = { total: 4, byRole: { seat: 1, shore: 3 } };
    const counts = { total: 2, byRole: { seat: 1, shore: 1 } };
    const line = [
      { id: 'a', role: 'seat' as const },
      { id: 'b', role: 'shore' as const },
      { id: 'c', role: 'shore' as const },
      { id: 'd', role: 'shore' as const },
    ];
    expect(promotions(caps, counts, line)).toEqual(['b', 'c']);
  });

  it('promotes nobody when the crew is full', () => {
    expect(promotions({ total: 2, byRole: {} }, { total: 2, byRole: { seat: 2 } }, [{ id: 'a', role: 'seat' }])).toEqual([]);
  });
});
