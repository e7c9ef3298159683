/**
 * Tide part of `npm run bench`: loads the Safety Harbor station from the open dataset, then
 * times a year of low-water windows at 6-minute resolution for a plausible (invented) site in
 * Old Tampa Bay. Target: under 300 ms per year once the station is loaded.
 */
import { performance } from 'node:perf_hooks';
import { createTideStationDirectory } from '../adapters/tide-stations.js';
import { daylightIntervals } from '../domain/tide/daylight.js';
import { predictLevelsMetres } from '../domain/tide/predict.js';
import { rankWindows } from '../domain/tide/window-ranking.js';
import { findLowWaterWindows } from '../domain/tide/windows.js';
import type { TideStation } from '../domain/tide/types.js';

/** Invented bench site near the station; elevations in metres above MLLW. */
const SITE = {
  latitude: 27.99,
  longitude: -82.69,
  timeZone: 'America/New_York',
  bedElevation: 0.2,
  routeElevation: -0.15,
  workingDepth: 0.45,
  draft: 0.15,
  margin: 0.08,
};

/** One year of ranked windows for the bench site; returns how many windows were found. */
function yearOfWindows(station: TideStation, fromMs: number): number {
  const toMs = fromMs + 365 * 86_400_000;
  const series = predictLevelsMetres(station, { fromMs, toMs, stepMinutes: 6 });
  const daylight = daylightIntervals({ ...SITE, fromMs, toMs, includeCivilTwilight: true });
  const windows = findLowWaterWindows({ ...SITE, series, daylight });
  return rankWindows(windows, SITE).length;
}

const fmt = (ms: number) => `${ms.toFixed(0)} ms`;
const mib = (bytes: number) => `${(bytes / 2 ** 20).toFixed(0)} MiB`;

/** Prints station load time, the year-of-windows time (first and median of 5) and memory. */
export async function benchTide(log: (s: string) => void): Promise<void> {
  const rssBefore = process.memoryUsage().rss;
  const t0 = performance.now();
  const station = await createTideStationDirectory().get('noaa/8726738');
  const loadMs = performance.now() - t0;
  if (!station) throw new Error('noaa/8726738 is missing from the tide dataset');
  log(`tide dataset + station noaa/8726738 loaded in ${fmt(loadMs)}; rss ${mib(process.memoryUsage().rss)} (was ${mib(rssBefore)})`);
  const fromMs = Date.UTC(2026, 0, 1, 5);
  const runs: number[] = [];
  let count = 0;
  for (let i = 0; i < 6; i++) {
    const t = performance.now();
    count = yearOfWindows(station, fromMs);
    runs.push(performance.now() - t);
  }
  const first = runs[0] ?? 0;
  const warm = runs.slice(1).sort((a, b) => a - b);
  log(`low-water windows, 1 year at 6-min steps (${count} windows): first ${fmt(first)}, median ${fmt(warm[2] ?? 0)} (target < 300 ms)`);
  log(`after tide bench: rss ${mib(process.memoryUsage().rss)}, heap used ${mib(process.memoryUsage().heapUsed)}`);
}
