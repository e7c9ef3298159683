import { describe, expect, it } from 'vitest';
import { formatShare, formatVolumeBoth, fromLitres, LITRES_PER_US_GALLON, toLitres, volumeUnitFor } from '@/utils/nursery';
import { roundEntry } from '@/utils/nursery-round';
import { growthChart, growthSummary, niceStep } from '@/utils/nursery-growth';
import { buildTree } from '../support/nursery';

describe('tank volumes', () => {
  it('uses the exact US gallon', () => {
    // NIST Handbook 44, Appendix C: 1 US gallon = 231 in³; 1 in³ = 16.387064 cm³ exactly → 3.785411784 L.
    expect(LITRES_PER_US_GALLON).toBeCloseTo((231 * 16.387064) / 1000, 12);
  });

  it.each([
    // TRADE.md §4 mixing example: a 5 US gal bucket is 18.93 L.
    [5, 'gal', 18.93],
    // A 100 gal stock tank: 378.5411784 L, kept to 0.01 L.
    [100, 'gal', 378.54],
    [570, 'L', 570],
  ] as const)('%s %s is %s L', (value, unit, litres) => {
    expect(toLitres(value, unit)).toBe(litres);
  });

  it('converts back and shows both units, the organisation\'s first', () => {
    expect(fromLitres(18.93, 'gal')).toBe(5);
    expect(formatVolumeBoth(378.54, 'ft')).toBe('100 gal (378.5 L)');
    expect(formatVolumeBoth(570, 'm')).toBe('570 L (151 gal)');
    expect(volumeUnitFor('ft')).toBe('gal');
    expect(volumeUnitFor('m')).toBe('L');
  });

  it('rounds shares of time to whole percent', () => {
    expect(formatShare(0.2741)).toBe('27%');
  });
});

describe('a measurement round row', () => {
  const tree = buildTree({ healthy: true });
  const row = (over: Partial<{ height: string; leaves: string; healthy: boolean; note: string }>) => ({ tree, height: '', leaves: '', healthy: true, note: '', ...over });

  it('skips a row with nothing typed', () => {
    expect(roundEntry(row({}))).toBeNull();
  });

  it('sends what was typed with the health seen that day', () => {
    expect(roundEntry(row({ height: '41,5', leaves: '9' }))).toEqual({ treeId: tree.id, heightCm: 41.5, leafCount: 9, healthy: true });
    expect(roundEntry(row({ healthy: false, note: ' scale insects ' }))).toEqual({ treeId: tree.id, healthy: false, note: 'scale insects' });
  });

  it('explains values it cannot read', () => {
    expect(roundEntry(row({ height: 'tall' }))).toBe('height must be a number of cm from 0 to 500');
    expect(roundEntry(row({ leaves: '4.5' }))).toBe('leaf count must be a whole number');
  });
});

describe('the growth chart', () => {
  const points = [
    { at: '2025-02-01T12:00:00.000Z', heightCm: 24 },
    { at: '2025-03-01T12:00:00.000Z', heightCm: 32 },
    { at: '2025-03-15T12:00:00.000Z', heightCm: 35 },
  ];

  it.each([
    [8, 2],
    [32, 10],
    [35, 10],
    [120, 50],
    [0, 1],
  ])('picks a round gridline step for a tallest tree of %s cm', (max, step) => {
    expect(niceStep(max)).toBe(step);
  });

  it('draws heights from 0 cm and dates from the first to the last measurement', () => {
    const chart = growthChart(points);
    // 0–40 cm over y 152 → 12 (140 px): 24 cm → 68, 35 cm → 29.5.
    expect(chart.yTicks.map((t) => t.label)).toEqual(['0', '10', '20', '30', '40']);
    expect(chart.dots[0]).toMatchObject({ x: 40, y: 68 });
    expect(chart.dots[2]).toMatchObject({ x: 344, y: 29.5 });
    // 1 Mar is 28 of the 42 days along 304 px.
    expect(chart.dots[1]!.x).toBeCloseTo(40 + (28 / 42) * 304, 1);
    expect(chart.path.startsWith('M40 68 L')).toBe(true);
    expect(chart.xTicks.map((t) => t.label)).toEqual(['1 Feb', '15 Mar']);
  });

  it('centres a single measurement and says it in words', () => {
    expect(growthChart([points[0]!]).dots[0]!.x).toBe(192);
    expect(growthSummary(points)).toBe('Height over time: from 24 cm on 1 Feb 2025 to 35 cm on 15 Mar 2025, 3 measurements.');
  });
});
