import { describe, expect, it } from 'vitest';
import { formatCoordinates, parseCoordinatePair } from '@/utils/coordinates';

describe('parseCoordinatePair', () => {
  it.each([
    ['27.99, -82.69', 27.99, -82.69],
    ['27.99,-82.69', 27.99, -82.69],
    ['  27.99   -82.69 ', 27.99, -82.69],
    ['27.99; \u221282.69', 27.99, -82.69],
    ['27.99° N, 82.69° W', 27.99, -82.69],
    ['82.69 W 27.99 N', 27.99, -82.69],
    ['-33.86, 151.21', -33.86, 151.21],
  ])('reads "%s" as %s, %s', (text, latitude, longitude) => {
    expect(parseCoordinatePair(text)).toEqual({ latitude, longitude });
  });

  it.each(['27.99', '', 'abc, def', '95, 10', '10, 190', '27.99, -82.69, 3'])('gives null for "%s"', (text) => {
    expect(parseCoordinatePair(text)).toBeNull();
  });

  it('formats a point with true minus signs', () => {
    expect(formatCoordinates(27.99, -82.69)).toBe('27.9900, \u221282.6900');
  });
});
