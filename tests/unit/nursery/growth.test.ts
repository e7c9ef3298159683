/**
 * "Ready by date X" from height measurements. Hand-built measurements (invented); the expected
 * dates are worked by hand from the least-squares slope (Σ(x − x̄)(y − ȳ) / Σ(x − x̄)²).
 */
import { describe, expect, it } from 'vitest';
import { growthForecast } from '../../../server/domain/nursery/growth.js';

describe('growthForecast', () => {
  it('30 → 36 cm over 30 days is 0.2 cm/day; 45 cm is 9 cm / 0.2 = 45 days after the last measurement', () => {
    const f = growthForecast({
      measurements: [
        { date: '2026-01-01', heightCm: 30 },
        { date: '2026-01-31', heightCm: 36 },
      ],
      neededHeightCm: 45,
    });
    expect(f).toEqual({ rateCmPerDay: 0.2, readyOn: '2026-03-17' });
  });

  it('fits a least-squares line through noisy points: (0, 30), (10, 33), (20, 34) → 40/200 = 0.2 cm/day', () => {
    const f = growthForecast({
      measurements: [
        { date: '2026-04-21', heightCm: 34 },
        { date: '2026-04-01', heightCm: 30 },
        { date: '2026-04-11', heightCm: 33 },
      ],
      neededHeightCm: 35,
    });
    // From the latest measured height (34 cm on 04-21): 1 cm / 0.2 = 5 days.
    expect(f).toEqual({ rateCmPerDay: 0.2, readyOn: '2026-04-26' });
  });

  it('uses only the last N measurements (a stall long ago does not drag the rate)', () => {
    const measurements = [
      { date: '2026-01-01', heightCm: 10 },
      { date: '2026-01-31', heightCm: 10 },
      { date: '2026-03-02', heightCm: 16 },
      { date: '2026-04-01', heightCm: 22 },
    ];
    expect(growthForecast({ measurements, neededHeightCm: 30, lastN: 3 })).toEqual({ rateCmPerDay: 0.2, readyOn: '2026-05-11' });
    // All four (days 0, 30, 60, 90; 10, 10, 16, 22 cm): 630 / 4500 = 0.14 cm/day.
    expect(growthForecast({ measurements, neededHeightCm: 30 }).rateCmPerDay).toBe(0.14);
  });

  it('is already there: the latest measurement date', () => {
    const f = growthForecast({ measurements: [{ date: '2026-02-01', heightCm: 50 }], neededHeightCm: 45 });
    expect(f).toEqual({ rateCmPerDay: null, readyOn: '2026-02-01' });
  });

  it('gives no date with fewer than two measurements or two on one day', () => {
    expect(growthForecast({ measurements: [], neededHeightCm: 45 })).toEqual({ rateCmPerDay: null, readyOn: null, reason: 'too_few_measurements' });
    expect(growthForecast({ measurements: [{ date: '2026-02-01', heightCm: 30 }], neededHeightCm: 45 }).reason).toBe('too_few_measurements');
    const sameDay = [
      { date: '2026-02-01', heightCm: 30 },
      { date: '2026-02-01', heightCm: 31 },
    ];
    expect(growthForecast({ measurements: sameDay, neededHeightCm: 45 }).reason).toBe('too_few_measurements');
  });

  it('gives no date when the tree is not growing (flat or shrinking)', () => {
    const flat = [
      { date: '2026-02-01', heightCm: 30 },
      { date: '2026-03-01', heightCm: 30 },
    ];
    expect(growthForecast({ measurements: flat, neededHeightCm: 45 })).toEqual({ rateCmPerDay: 0, readyOn: null, reason: 'not_growing' });
    const dieback = [
      { date: '2026-02-01', heightCm: 32 },
      { date: '2026-03-03', heightCm: 29 },
    ];
    expect(growthForecast({ measurements: dieback, neededHeightCm: 45 })).toEqual({ rateCmPerDay: -0.1, readyOn: null, reason: 'not_growing' });
  });
});
