import { describe, expect, it } from 'vitest';
import { distanceUnit, formatDistance, formatDuration, formatLevel, fromDisplayDistance, toDisplayDistance } from '@/utils/tide-format';

describe('tide formatting', () => {
  it.each([
    [-0.42, 'ft', 1, '\u22120.4 ft'],
    [1.25, 'm', 2, '1.25 m'],
    [-0.04, 'ft', 1, '0.0 ft'],
    [0, 'm', 1, '0.0 m'],
  ] as const)('formatLevel(%s, %s, %s) is "%s"', (value, units, digits, text) => {
    expect(formatLevel(value, units, digits)).toBe(text);
  });

  // The international nautical mile is exactly 1852 m (International Hydrographic Conference 1929;
  // BIPM SI Brochure, 9th ed., Table 8).
  it.each([
    [1852, 'ft', 1],
    [2500, 'm', 2.5],
  ] as const)('toDisplayDistance(%s m, %s) is %s', (metres, units, value) => {
    expect(toDisplayDistance(metres, units)).toBeCloseTo(value, 12);
    expect(fromDisplayDistance(value, units)).toBeCloseTo(metres, 9);
  });

  it('uses nautical miles with feet and kilometres with metres', () => {
    expect(distanceUnit('ft')).toBe('nmi');
    expect(distanceUnit('m')).toBe('km');
    expect(formatDistance(2778, 'ft')).toBe('1.5 nmi');
    expect(formatDistance(2778, 'm')).toBe('2.8 km');
  });

  it.each([
    [45, '45 min'],
    [120, '2 h'],
    [155, '2 h 35 min'],
    [-3, '0 min'],
  ])('formatDuration(%s) is "%s"', (minutes, text) => {
    expect(formatDuration(minutes)).toBe(text);
  });
});
