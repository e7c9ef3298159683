/**
 * Seawater density at one atmosphere and hydrometer specific gravity ↔ practical salinity.
 *
 * Equation: the UNESCO 1981 international one-atmosphere equation of state of seawater (EOS-80),
 * Millero, F.J. & Poisson, A. (1981), Deep-Sea Res. 28A(6):625–629; coefficients as printed in
 * UNESCO Technical Papers in Marine Science 36 (1981) and 44 (Fofonoff & Millard 1983, eqns 13–14,
 * p. 17); the same numbers are in python-seawater `seawater/eos80.py` (`dens0`) and
 * `seawater/library.py` (`smow`). EOS-80 is stated on the IPTS-68 temperature scale; inputs here are
 * ITS-90 °C (what a thermometer reads today) and are converted with t68 = 1.00024·t90 (Saunders
 * 1991), as python-seawater does. Salinity is practical salinity (PSS-78), numerically ≈ ppt.
 *
 * Specific gravity is "t/t": the sample's density over pure water's density at the same
 * temperature, as seawater hydrometer tables state it.
 */
import { NurseryInputError, requireRange } from './errors.js';

/** IPTS-68 degrees per ITS-90 degree over the oceanographic range (Saunders 1991). */
export const T68_PER_T90 = 1.00024;

/** Ranges the functions accept: the equation's salinity range (UNESCO 44: S 0–42) and the brief's. */
export const SEAWATER_RANGES = {
  temperatureC: { min: 0, max: 40 },
  salinity: { min: 0, max: 42 },
  specificGravity: { min: 0.998, max: 1.035 },
} as const;

// UNESCO 44 eqn (14): density of Standard Mean Ocean Water (pure water), kg/m³, t in °C (IPTS-68).
const A = [999.842594, 6.793952e-2, -9.09529e-3, 1.001685e-4, -1.120083e-6, 6.536332e-9] as const;
// UNESCO 44 eqn (13): the S, S^1.5 and S² terms.
const B = [8.24493e-1, -4.0899e-3, 7.6438e-5, -8.2467e-7, 5.3875e-9] as const;
const C = [-5.72466e-3, 1.0227e-4, -1.6546e-6] as const;
const D0 = 4.8314e-4;

/** Horner evaluation of c0 + c1·x + c2·x² + … */
function poly(coefficients: readonly number[], x: number): number {
  return coefficients.reduceRight((acc, c) => acc * x + c, 0);
}

function checkTemperature(temperatureC: number): void {
  const r = SEAWATER_RANGES.temperatureC;
  requireRange('temperatureC', temperatureC, r.min, r.max, '°C');
}

function checkSalinity(salinity: number): void {
  const r = SEAWATER_RANGES.salinity;
  requireRange('salinity', salinity, r.min, r.max, 'ppt');
}

/**
 * Density of pure water ρw(t) in kg/m³ at one atmosphere (EOS-80's SMOW polynomial).
 * @example pureWaterDensity(25) // ≈ 997.046
 */
export function pureWaterDensity(temperatureC: number): number {
  checkTemperature(temperatureC);
  return poly(A, temperatureC * T68_PER_T90);
}

/**
 * Density of seawater ρ(S, t, 0) in kg/m³ at one atmosphere (EOS-80).
 * @example seawaterDensity(35, 25) // ≈ 1023.341 (1023.343 at t68 = 25, UNESCO 44's check value)
 */
export function seawaterDensity(salinity: number, temperatureC: number): number {
  checkSalinity(salinity);
  const t = temperatureC * T68_PER_T90;
  return pureWaterDensity(temperatureC) + poly(B, t) * salinity + poly(C, t) * salinity ** 1.5 + D0 * salinity ** 2;
}

/**
 * Specific gravity t/t of seawater: ρ(S, t) / ρw(t).
 * @example specificGravityFromSalinity(35, 25) // ≈ 1.02637
 */
export function specificGravityFromSalinity(salinity: number, temperatureC: number): number {
  return seawaterDensity(salinity, temperatureC) / pureWaterDensity(temperatureC);
}

/**
 * Practical salinity (≈ ppt) from a hydrometer's specific gravity t/t read at `temperatureC`,
 * by bisection on S in 0–42 (specific gravity rises monotonically with S). Readings from 0.998 up
 * to 1 (below pure water, within a hydrometer's error) give 0.
 * @throws NurseryInputError for SG outside 0.998–1.035, temperature outside 0–40 °C, or an SG
 *   above what S 42 gives at that temperature.
 * @example salinityFromSpecificGravity(1.015, 25) // ≈ 19.94
 */
export function salinityFromSpecificGravity(specificGravity: number, temperatureC: number): number {
  const r = SEAWATER_RANGES.specificGravity;
  requireRange('specificGravity', specificGravity, r.min, r.max);
  checkTemperature(temperatureC);
  if (specificGravity <= 1) return 0;
  const maxS = SEAWATER_RANGES.salinity.max;
  const maxSg = specificGravityFromSalinity(maxS, temperatureC);
  if (specificGravity > maxSg) {
    throw new NurseryInputError(
      'specificGravity',
      `Specific gravity ${specificGravity} at ${temperatureC} °C is above S ${maxS} (SG ${maxSg.toFixed(4)}), the equation's range.`,
    );
  }
  let lo = 0;
  let hi: number = maxS;
  for (let i = 0; i < 60; i++) {
    const mid = (lo + hi) / 2;
    if (specificGravityFromSalinity(mid, temperatureC) < specificGravity) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}
