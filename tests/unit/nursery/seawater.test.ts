/**
 * EOS-80 one-atmosphere density and hydrometer specific gravity, each check with its source.
 *
 * Reference library: the npm registry has no seawater / EOS-80 / TEOS-10 package to compare
 * against — `npm view seawater`, `gsw`, `teos-10`, `gsw-js` and `eos80` all answer 404 (looked
 * up 2026-12), and the registry list in the workplace has none. So the library check uses
 * TEOS-10's reference implementation, gsw 3.6.16 (Debian python3-gsw), run once; its numbers are
 * in tests/fixtures/nursery/teos10-gsw-seawater.json with the exact calls used.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { NurseryInputError } from '../../../server/domain/nursery/errors.js';
import {
  pureWaterDensity,
  salinityFromSpecificGravity,
  seawaterDensity,
  specificGravityFromSalinity,
  T68_PER_T90,
} from '../../../server/domain/nursery/seawater.js';

interface GswFixture {
  library: string;
  densities: { salinity: number; temperatureC: number; density: number }[];
  specificGravities: { salinity: number; temperatureC: number; specificGravity: number }[];
}
const gsw: GswFixture = JSON.parse(readFileSync(new URL('../../fixtures/nursery/teos10-gsw-seawater.json', import.meta.url), 'utf8'));

/** ITS-90 °C for a temperature stated on IPTS-68, as UNESCO 44's check values are. */
const fromT68 = (t68: number) => t68 / T68_PER_T90;

describe('EOS-80 density against UNESCO 44 check values', () => {
  // Fofonoff & Millard 1983, UNESCO Tech. Pap. Mar. Sci. 44, check values for ρ(S, t, 0) with
  // t on IPTS-68, as quoted in the R package oce (dankelley/oce R/sw.R, swRho examples).
  // This is where "ρ(35, 25, 0) = 1023.343" comes from: it holds at t68 = 25 °C. At 25 °C ITS-90
  // the same equation gives 1023.3412 (0.0019 lower), checked below against TEOS-10.
  it.each([
    [35, 5, 1027.67547],
    [35, 25, 1023.34306],
  ])('ρ(%d, t68 = %d °C, 0) = %f kg/m³', (s, t68, rho) => {
    expect(seawaterDensity(s, fromT68(t68))).toBeCloseTo(rho, 5);
  });

  // python-seawater's dens0 doctest, "Data from UNESCO Tech. Paper in Marine Sci. No. 44, p22"
  // (pyoceans/python-seawater seawater/eos80.py), t on IPTS-68.
  it.each([
    [0, 0, 999.842594],
    [0, 30, 995.65113374],
    [35, 0, 1028.10633141],
    [35, 30, 1021.72863949],
  ])('ρ(%d, t68 = %d °C, 0) = %f kg/m³ (python-seawater doctest)', (s, t68, rho) => {
    expect(seawaterDensity(s, fromT68(t68))).toBeCloseTo(rho, 6);
  });

  it('pure water is the S = 0 limit (ρw(t68 = 0) = 999.842594, UNESCO 44 eqn 14 constant)', () => {
    expect(pureWaterDensity(0)).toBe(999.842594);
    expect(seawaterDensity(0, 17)).toBe(pureWaterDensity(17));
  });
});

describe(`EOS-80 density against TEOS-10 (${gsw.library})`, () => {
  // Tolerance 0.01 kg/m³: EOS-80 and TEOS-10 are different fits; over this grid they differ by
  // at most 0.008 kg/m³ (largest at 40 °C), far below what a hydrometer resolves (~0.5 kg/m³).
  it.each(gsw.densities.map((d) => [d.salinity, d.temperatureC, d.density]))('ρ(%d, %d °C) ≈ %f kg/m³', (s, t, rho) => {
    expect(Math.abs(seawaterDensity(s, t) - rho)).toBeLessThan(0.01);
  });

  it('ρ(35, 25 °C) = 1023.343 and ρw(25 °C) = 997.048 to 0.003 kg/m³ (TEOS-10 fixture)', () => {
    expect(seawaterDensity(35, 25)).toBeCloseTo(1023.343, 2);
    expect(pureWaterDensity(25)).toBeCloseTo(997.048, 2);
  });

  it.each(gsw.specificGravities.map((g) => [g.salinity, g.temperatureC, g.specificGravity]))(
    'SG t/t of S %d at %d °C ≈ %f',
    (s, t, sg) => {
      expect(specificGravityFromSalinity(s, t)).toBeCloseTo(sg, 5);
    },
  );
});

describe('specific gravity ↔ salinity (TRADE.md §4)', () => {
  it('S 35 at 25/25 °C → SG 1.02637 (TRADE.md check 1; published 1.0264 at 77 °F, reefcentral quote of advancedaquarist.com [PUB])', () => {
    expect(specificGravityFromSalinity(35, 25)).toBeCloseTo(1.02637, 5);
    expect(specificGravityFromSalinity(35, 25).toFixed(4)).toBe('1.0264');
  });

  it('S 35 at 20/20 °C → SG 1.0266 (same published table, 20 °C column; t/t assumed)', () => {
    expect(specificGravityFromSalinity(35, 20).toFixed(4)).toBe('1.0266');
  });

  it('SG 1.0150 at 25/25 °C → S 19.9 (TRADE.md check 2)', () => {
    expect(salinityFromSpecificGravity(1.015, 25).toFixed(1)).toBe('19.9');
  });

  it('S 20 at 25/25 °C → SG 1.01505 (TRADE.md: TEOS-10 via python3-gsw gives 1.01505)', () => {
    expect(specificGravityFromSalinity(20, 25)).toBeCloseTo(1.01505, 5);
  });

  it.each([
    [5, 10],
    [20, 25],
    [35, 30],
    [41, 0],
  ])('round-trips S %d at %d °C', (s, t) => {
    expect(salinityFromSpecificGravity(specificGravityFromSalinity(s, t), t)).toBeCloseTo(s, 6);
  });

  it('reads 0 for SG from 0.998 up to 1 (below pure water, within a hydrometer’s error)', () => {
    expect(salinityFromSpecificGravity(0.999, 25)).toBe(0);
    expect(salinityFromSpecificGravity(1, 25)).toBe(0);
  });
});

describe('out-of-range input', () => {
  it.each([
    [0.99, 25, 'specificGravity', 'specificGravity must be between 0.998 and 1.035 (got 0.99).'],
    [1.04, 25, 'specificGravity', 'specificGravity must be between 0.998 and 1.035 (got 1.04).'],
    [1.02, 45, 'temperatureC', 'temperatureC must be between 0 and 40 °C (got 45 °C).'],
    [1.02, -1, 'temperatureC', 'temperatureC must be between 0 and 40 °C (got -1 °C).'],
    [1.035, 25, 'specificGravity', "Specific gravity 1.035 at 25 °C is above S 42 (SG 1.0317), the equation's range."],
  ])('SG %f at %d °C fails on %s', (sg, t, field, message) => {
    const attempt = () => salinityFromSpecificGravity(sg, t);
    expect(attempt).toThrow(NurseryInputError);
    expect(attempt).toThrow(message);
    expect(() => salinityFromSpecificGravity(sg, t)).toThrow(expect.objectContaining({ field }));
  });

  it('rejects salinity outside 0–42 in the density functions', () => {
    expect(() => seawaterDensity(43, 20)).toThrow('salinity must be between 0 and 42 ppt (got 43 ppt).');
    expect(() => specificGravityFromSalinity(-1, 20)).toThrow(NurseryInputError);
  });
});
