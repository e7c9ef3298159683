/**
 * Mixing water of two salinities by mass balance: C1·V1 + C2·V2 = Ct·(V1 + V2). Salinity is
 * treated as if it mixed by volume; treating mass ppt as volume is off by about 1–2% (TRADE.md §4,
 * from memory), well inside a refractometer's reading.
 */
import { NurseryInputError, requirePpt, requireRange } from './errors.js';
import { formatPpt } from './format.js';

/** Litres of stock water and of fresh (or low-salinity) water that make the mix. */
export interface MixVolumes {
  stockLitres: number;
  freshLitres: number;
}

/**
 * Volumes of stock water (`stockPpt`) and fresh water (`freshPpt`, 0 by default) that make
 * `totalLitres` at `targetPpt`: stock = Vt·(Ct − Cf)/(Cs − Cf), fresh = Vt − stock.
 * @throws NurseryInputError when the target is not between the two waters' salinities.
 * @example mixVolumes({ targetPpt: 20, totalLitres: 18.93, stockPpt: 35 }) // { stockLitres ≈ 10.82, freshLitres ≈ 8.11 }
 */
export function mixVolumes(input: { targetPpt: number; totalLitres: number; stockPpt: number; freshPpt?: number }): MixVolumes {
  const { targetPpt, totalLitres, stockPpt, freshPpt = 0 } = input;
  requirePpt('targetPpt', targetPpt);
  requirePpt('stockPpt', stockPpt);
  requirePpt('freshPpt', freshPpt);
  requireRange('totalLitres', totalLitres, 0, Number.MAX_VALUE, 'L');
  const lo = Math.min(stockPpt, freshPpt);
  const hi = Math.max(stockPpt, freshPpt);
  if (targetPpt < lo || targetPpt > hi) {
    throw new NurseryInputError('targetPpt', `${formatPpt(targetPpt)} cannot be mixed from ${formatPpt(stockPpt)} and ${formatPpt(freshPpt)} water.`);
  }
  const stockLitres = stockPpt === freshPpt ? totalLitres : (totalLitres * (targetPpt - freshPpt)) / (stockPpt - freshPpt);
  return { stockLitres, freshLitres: totalLitres - stockLitres };
}

/**
 * Litres of tank water to take out and replace with water at `stockPpt` to bring `volumeLitres`
 * from `fromPpt` to `toPpt`: x = V·(C1 − C0)/(Cs − C0). Works both ways: raise with sea water,
 * lower with fresh (or any lower-salinity) water.
 * @throws NurseryInputError when `toPpt` is not between `fromPpt` and `stockPpt` (that stock
 *   cannot get there even by replacing all the water).
 * @example replaceVolume({ volumeLitres: 18.93, fromPpt: 10, toPpt: 15, stockPpt: 35 }) // ≈ 3.79
 */
export function replaceVolume(input: { volumeLitres: number; fromPpt: number; toPpt: number; stockPpt: number }): number {
  const { volumeLitres, fromPpt, toPpt, stockPpt } = input;
  requirePpt('fromPpt', fromPpt);
  requirePpt('toPpt', toPpt);
  requirePpt('stockPpt', stockPpt);
  requireRange('volumeLitres', volumeLitres, 0, Number.MAX_VALUE, 'L');
  if (toPpt === fromPpt) return 0;
  const up = toPpt > fromPpt;
  if (up ? stockPpt < toPpt : stockPpt > toPpt) {
    const need = up ? 'at least' : 'at most';
    throw new NurseryInputError(
      'stockPpt',
      `Water at ${formatPpt(stockPpt)} cannot take the tank from ${formatPpt(fromPpt)} to ${formatPpt(toPpt)}; use water of ${need} ${formatPpt(toPpt)}.`,
    );
  }
  return (volumeLitres * (toPpt - fromPpt)) / (stockPpt - fromPpt);
}
