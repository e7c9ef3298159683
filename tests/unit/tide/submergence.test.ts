/**
 * Share of time submerged, checked on TRADE.md §3's worked example: a hypothetical station
 * (ft above MLLW) with MLW 0.35, MSL 1.25, MHW 2.10, the tide modelled as a sine of amplitude
 * A = (MHW − MLW)/2 = 0.875; a bed at z is flooded arccos((z − MSL)/A)/π of the time.
 * TRADE.md's values: z = MSL → 50%; z = 1.77 → 30% (the ~30% limit is Lewis 2005, [PUB]);
 * z = 0.80 → 67% ("Worked", recomputed by script in TRADE.md). The sine data is hand-built.
 */
import { describe, expect, it } from 'vitest';
import { seriesFromFunction } from '../../../server/domain/tide/series.js';
import { shareSubmerged } from '../../../server/domain/tide/submergence.js';

const MLW = 0.35;
const MSL = 1.25;
const MHW = 2.1;
const A = (MHW - MLW) / 2;
const PERIOD_MS = 12.42 * 3_600_000;
// Hand-built: 100 whole tidal cycles sampled every 6 minutes.
const cycles = 100;
const step = 6 * 60_000;
const sine = seriesFromFunction((t) => MSL + A * Math.cos((2 * Math.PI * t) / PERIOD_MS), 0, step, Math.round((cycles * PERIOD_MS) / step) + 1);

describe('shareSubmerged on TRADE.md §3 worked example (sine tide, ft above MLLW)', () => {
  it.each([
    [MSL, 0.5],
    [1.77, 0.3],
    [0.8, 0.67],
  ])('a bed at %f ft is flooded %f of the time (TRADE.md §3, Worked)', (z, share) => {
    expect(shareSubmerged(sine, z)).toBeCloseTo(share, 2);
  });

  it('agrees with the closed form arccos((z − MSL)/A)/π to 0.1%', () => {
    for (const z of [0.4, 0.9, 1.5, 2.0]) {
      expect(Math.abs(shareSubmerged(sine, z) - Math.acos((z - MSL) / A) / Math.PI)).toBeLessThan(0.001);
    }
  });

  it('is 0 above the highest water and 1 below the lowest (MSL ± A)', () => {
    expect(shareSubmerged(sine, MSL + A + 0.01)).toBe(0);
    expect(shareSubmerged(sine, MSL - A - 0.01)).toBe(1);
  });
});
