/** A hand-built (invented) pure semidiurnal sine tide for the readiness tests: a year at 6-minute steps. */
import { seriesFromFunction } from '../../../server/domain/tide/series.js';
import type { TideExtreme } from '../../../server/domain/tide/types.js';
import type { SiteTide } from '../../../server/domain/nursery/crown-clearance.js';

const PERIOD_MS = 12.42 * 3_600_000; // M2
const STEP_MS = 6 * 60_000;
const YEAR_MS = 365 * 86_400_000;
const START_MS = Date.UTC(2026, 0, 1);

/**
 * Level = msl + amplitude·cos(2π(t − start)/12.42 h), with its highs and lows. Every high is the
 * same, so MHHW = MHW = msl + amplitude, and MSL = msl.
 */
export function sineTide(msl: number, amplitude: number): SiteTide {
  const level = (t: number) => msl + amplitude * Math.cos((2 * Math.PI * (t - START_MS)) / PERIOD_MS);
  const series = seriesFromFunction(level, START_MS, STEP_MS, YEAR_MS / STEP_MS + 1);
  const extremes: TideExtreme[] = [];
  for (let k = 0; START_MS + (k * PERIOD_MS) / 2 <= START_MS + YEAR_MS; k++) {
    const timeMs = START_MS + (k * PERIOD_MS) / 2;
    extremes.push({ timeMs, height: level(timeMs), type: k % 2 === 0 ? 'high' : 'low' });
  }
  return { series, extremes };
}
