/** Datum bookkeeping on hand-built (invented) station records. */
import { describe, expect, it } from 'vitest';
import { availableDatums, datumShift, nodeCorrectionsFor, publishedDatums, UnknownDatumError, zeroDatum } from '../../../server/domain/tide/station-datums.js';
import { filterSmallExtremes, MIN_EXTREME_RANGE_M } from '../../../server/domain/tide/extremes.js';
import type { TideExtreme } from '../../../server/domain/tide/types.js';
import { fromMetres, toMetres } from '../../../server/domain/tide/units.js';
import { handBuiltStation } from './helpers.js';

describe('station datums', () => {
  const station = handBuiltStation();

  it('uses MLLW as the zero datum where published, else the chart datum, else MSL', () => {
    expect(zeroDatum(station)).toBe('MLLW');
    expect(zeroDatum({ datums: { LAT: 0.2, MSL: 1 }, chartDatum: 'LAT' })).toBe('LAT');
    expect(zeroDatum({ datums: { MSL: 1 } })).toBe('MSL');
  });

  it('lists elevation datums only (no ranges such as GT)', () => {
    expect(availableDatums(station).sort()).toEqual(['MHHW', 'MHW', 'MLLW', 'MLW', 'MSL', 'STND']);
    expect(availableDatums({ ...station, kind: 'subordinate' })).toEqual(['MLLW']);
  });

  it('shifts heights above MLLW to another datum', () => {
    expect(datumShift(station, 'MLLW')).toBe(0);
    expect(datumShift(station, 'MSL')).toBeCloseTo(-0.5, 12);
    expect(() => datumShift(station, 'GT')).toThrow(UnknownDatumError);
    expect(publishedDatums(station)).toMatchObject({ MLLW: 0, MSL: 0.5, MHHW: 1 });
    expect(publishedDatums({ ...station, kind: 'subordinate' })).toEqual({});
  });

  it('uses Schureman node corrections for NOAA stations and the IHO default elsewhere', () => {
    expect(nodeCorrectionsFor({ id: 'noaa/8726738' })).toBe('schureman');
    expect(nodeCorrectionsFor({ id: 'ticon/newlyn-new-gbr-bodc' })).toBe('iho');
  });

  it('converts feet and metres with the international foot', () => {
    expect(fromMetres(0.3048, 'ft')).toBeCloseTo(1, 12);
    expect(toMetres(2, 'ft')).toBeCloseTo(0.6096, 12);
    expect(fromMetres(1.5, 'm')).toBe(1.5);
  });
});

describe('filterSmallExtremes', () => {
  const e = (h: number, height: number, type: 'high' | 'low'): TideExtreme => ({ timeMs: h * 3_600_000, height, type });

  it('removes a small stand as a high/low pair, keeping highs and lows alternating', () => {
    const raw = [e(0, 0.2, 'low'), e(6, 0.50, 'high'), e(7, 0.495, 'low'), e(12, 0.9, 'high'), e(18, 0.1, 'low')];
    const kept = filterSmallExtremes(raw, MIN_EXTREME_RANGE_M);
    expect(kept.map((x) => x.timeMs / 3_600_000)).toEqual([0, 12, 18]);
  });

  it('keeps pairs at least the minimum range apart', () => {
    const raw = [e(0, 0.2, 'low'), e(6, 0.5, 'high'), e(7, 0.49, 'low'), e(12, 0.9, 'high')];
    expect(filterSmallExtremes(raw, MIN_EXTREME_RANGE_M)).toHaveLength(4);
  });
});
