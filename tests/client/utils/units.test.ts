import { describe, expect, it } from 'vitest';
import { formatLength, fromDisplayLength, toDisplayLength, unitName } from '@/utils/units';

// The international foot is exactly 0.3048 m (NIST Handbook 44, Appendix C; US Federal Register 1959).
describe('length units', () => {
  it.each([
    [0.3048, 'ft', 1],
    [1, 'ft', 3.280839895013123],
    [1.5, 'm', 1.5],
  ] as const)('toDisplayLength(%s, %s) is %s', (metres, units, expected) => {
    expect(toDisplayLength(metres, units)).toBeCloseTo(expected, 12);
  });

  it.each([
    [1, 'ft', 0.3048],
    [10, 'ft', 3.048],
    [2, 'm', 2],
  ] as const)('fromDisplayLength(%s, %s) is %s m', (value, units, expected) => {
    expect(fromDisplayLength(value, units)).toBeCloseTo(expected, 12);
  });

  it.each([
    [0.3048, 'ft', 1, '1.0 ft'],
    [-0.25, 'm', 2, '\u22120.25 m'],
    [-0.01, 'm', 1, '0.0 m'],
    [1234.5, 'm', 0, '1,235 m'],
  ] as const)('formatLength(%s, %s, %s) is "%s"', (metres, units, digits, expected) => {
    expect(formatLength(metres, units, digits)).toBe(expected);
  });

  it('names the units in words for labels', () => {
    expect([unitName('ft'), unitName('m')]).toEqual(['feet', 'metres']);
  });
});
