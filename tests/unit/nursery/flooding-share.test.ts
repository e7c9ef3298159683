/**
 * The flooding share readiness reports, on a pure sine tide against the closed form
 * arccos((z − MSL)/A)/π. TRADE.md §3 worked example (hypothetical station, ft above MLLW):
 * MLW 0.35, MSL 1.25, MHW 2.10, A = (MHW − MLW)/2 = 0.875; z = MSL → 50%, z = 1.77 → 30%
 * (Lewis 2005's limit, [PUB]), z = 0.80 → 67%. Converted to metres (1 ft = 0.3048 m, exact);
 * the share does not depend on the unit. The tide is hand-built (sine-tide.ts).
 */
import { describe, expect, it } from 'vitest';
import { treeReadiness } from '../../../server/domain/nursery/readiness.js';
import { toMetres } from '../../../server/domain/tide/units.js';
import { sineTide } from './sine-tide.js';

const MSL = toMetres(1.25, 'ft');
const A = toMetres(0.875, 'ft');
const tide = sineTide(MSL, A);
const closedForm = (z: number) => Math.acos((z - MSL) / A) / Math.PI;

/** Readiness of a hand-built tree whose root collar stands at `collarM` and crown 1 cm above it. */
function sharesAt(collarM: number) {
  const r = treeReadiness({
    tree: { stage: 'ready', heightCm: 1, potHeightCm: 20 },
    site: { bedElevationM: collarM - 0.2, salinityPpt: 30 },
    tide,
    salinityReadings: [],
    today: '2026-01-01',
  });
  return r;
}

describe('flooding share on TRADE.md §3 sine tide', () => {
  it.each([
    [1.25, 0.5],
    [1.77, 0.3],
    [0.8, 0.67],
  ])('a root collar at %f ft is flooded %f of the time (TRADE.md §3, Worked)', (zFt, share) => {
    expect(sharesAt(toMetres(zFt, 'ft')).collarFloodedShare).toBeCloseTo(share, 2);
  });

  it('matches arccos((z − MSL)/A)/π to 0.2% from low to high water', () => {
    for (const zFt of [0.4, 0.9, 1.5, 2.0]) {
      const z = toMetres(zFt, 'ft');
      const r = sharesAt(z);
      expect(Math.abs(r.collarFloodedShare - closedForm(z))).toBeLessThan(0.002);
      expect(Math.abs(r.crownSubmergedShare - closedForm(z + 0.01))).toBeLessThan(0.002);
    }
  });

  it("reads MSL and MHHW from the year's series: MSL 1.25 ft and MHHW = MSL + A = 2.125 ft", () => {
    const r = sharesAt(0);
    expect(r.mslM).toBeCloseTo(MSL, 3);
    expect(r.mhhwM).toBeCloseTo(MSL + A, 6);
  });
});
