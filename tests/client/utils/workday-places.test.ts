import { describe, expect, it } from 'vitest';
import { availabilityText, crewPlacesLeft, offeredRoles, openPlaces, rolePlacesLeft } from '@/utils/workday-places';
import { buildWorkday } from '../support/workdays';

describe('workday places', () => {
  it('limits a capped role by its own cap and by the crew total', () => {
    const w = buildWorkday({
      capacity: 8,
      confirmed: 7,
      roles: [
        { role: 'planter', capacity: 6, confirmed: 3, waitlisted: 0 },
        { role: 'operator', capacity: 2, confirmed: 2, waitlisted: 1 },
      ],
    });

    expect(crewPlacesLeft(w)).toBe(1);
    expect(rolePlacesLeft(w, 'planter')).toBe(1);
    expect(rolePlacesLeft(w, 'operator')).toBe(0);
    expect(rolePlacesLeft(w, 'seat')).toBe(0);
    expect(openPlaces(w)).toBe(1);
  });

  it('lets any role fill the total when roles are not capped', () => {
    const w = buildWorkday({ roleCapped: false, capacity: 12, confirmed: 9, roles: [{ role: 'planter', capacity: 12, confirmed: 9, waitlisted: 0 }, { role: 'shore', capacity: 12, confirmed: 0, waitlisted: 0 }] });

    expect(rolePlacesLeft(w, 'shore')).toBe(3);
    expect(offeredRoles(w).map((r) => [r.role, r.left])).toEqual([['planter', 3], ['shore', 3]]);
  });

  it('offers only roles with a capacity above 0', () => {
    expect(offeredRoles(buildWorkday()).map((r) => r.role)).toEqual(['planter', 'own-kayak', 'operator']);
  });

  it.each([
    [{}, '4 places left'],
    [{ capacity: 6 }, 'Full: waitlist open'],
    [{ status: 'cancelled' as const }, 'Cancelled'],
    [{ status: 'completed' as const }, 'Completed'],
  ])('describes availability of %o as %s', (overrides, text) => {
    expect(availabilityText(buildWorkday(overrides))).toBe(text);
  });
});
