/** Mass-balance mixing, checked on TRADE.md §4's worked examples ("All worked numbers were recomputed by script"). */
import { describe, expect, it } from 'vitest';
import { NurseryInputError } from '../../../server/domain/nursery/errors.js';
import { mixVolumes, replaceVolume } from '../../../server/domain/nursery/mixing.js';

const FIVE_US_GALLONS = 18.93; // litres, as TRADE.md §4 rounds 5 × 3.785 L

describe('mixVolumes', () => {
  it('5 US gal at 20 ppt from 35 and 0 ppt → 10.82 L sea water + 8.11 L fresh (TRADE.md §4)', () => {
    const mix = mixVolumes({ targetPpt: 20, totalLitres: FIVE_US_GALLONS, stockPpt: 35 });
    expect(mix.stockLitres).toBeCloseTo(10.82, 2);
    expect(mix.freshLitres).toBeCloseTo(8.11, 2);
  });

  it('the same from 28 ppt bay water → 13.52 L + 5.41 L (TRADE.md §4)', () => {
    const mix = mixVolumes({ targetPpt: 20, totalLitres: FIVE_US_GALLONS, stockPpt: 28 });
    expect(mix.stockLitres).toBeCloseTo(13.52, 2);
    expect(mix.freshLitres).toBeCloseTo(5.41, 2);
  });

  it('mixes from low-salinity water instead of fresh: the mass balance holds (hand-built)', () => {
    const mix = mixVolumes({ targetPpt: 20, totalLitres: 10, stockPpt: 35, freshPpt: 5 });
    expect(mix.stockLitres).toBeCloseTo(5, 10);
    expect(35 * mix.stockLitres + 5 * mix.freshLitres).toBeCloseTo(20 * 10, 10);
  });

  it('refuses a target outside the two waters', () => {
    expect(() => mixVolumes({ targetPpt: 36, totalLitres: 10, stockPpt: 35 })).toThrow('36 ppt cannot be mixed from 35 ppt and 0 ppt water.');
    expect(() => mixVolumes({ targetPpt: 3, totalLitres: 10, stockPpt: 35, freshPpt: 5 })).toThrow(NurseryInputError);
  });
});

describe('replaceVolume', () => {
  it('18.93 L from 10 to 15 ppt with 35 ppt stock → swap 3.79 L (TRADE.md §4)', () => {
    expect(replaceVolume({ volumeLitres: FIVE_US_GALLONS, fromPpt: 10, toPpt: 15, stockPpt: 35 })).toBeCloseTo(3.79, 2);
  });

  it('goes down with fresh water: 18.93 L from 30 to 25 ppt → 3.155 L (hand-built; (18.93 − x)·30 = 18.93·25)', () => {
    const x = replaceVolume({ volumeLitres: FIVE_US_GALLONS, fromPpt: 30, toPpt: 25, stockPpt: 0 });
    expect(x).toBeCloseTo(3.155, 3);
    expect((FIVE_US_GALLONS - x) * 30).toBeCloseTo(FIVE_US_GALLONS * 25, 10);
  });

  it('swaps nothing when already there, and everything when the stock equals the target', () => {
    expect(replaceVolume({ volumeLitres: 50, fromPpt: 20, toPpt: 20, stockPpt: 35 })).toBe(0);
    expect(replaceVolume({ volumeLitres: 50, fromPpt: 30, toPpt: 35, stockPpt: 35 })).toBe(50);
  });

  it.each([
    [{ volumeLitres: 50, fromPpt: 30, toPpt: 36, stockPpt: 35 }, 'Water at 35 ppt cannot take the tank from 30 ppt to 36 ppt; use water of at least 36 ppt.'],
    [{ volumeLitres: 50, fromPpt: 30, toPpt: 20, stockPpt: 25 }, 'Water at 25 ppt cannot take the tank from 30 ppt to 20 ppt; use water of at most 20 ppt.'],
  ])('refuses an unreachable target %j', (input, message) => {
    expect(() => replaceVolume(input)).toThrow(message);
    expect(() => replaceVolume(input)).toThrow(expect.objectContaining({ field: 'stockPpt' }));
  });
});
