/** Scoring and cautions of low-water windows, on hand-built (invented) windows. */
import { describe, expect, it } from 'vitest';
import { CAUTION_TEXTS, DEFAULT_WINDOW_WEIGHTS, rankWindows, scoreWindow, startHourFit, type RankingOptions } from '../../../server/domain/tide/window-ranking.js';
import type { LowWaterWindow } from '../../../server/domain/tide/windows.js';

const MIN = 60_000;
const ZONE = 'America/New_York';
/** Band: floor 0.10 m, ceiling 0.50 m. */
const OPTIONS: RankingOptions = { timeZone: ZONE, bedElevation: 0.1, workingDepth: 0.4, routeElevation: -0.15, draft: 0.15, margin: 0.1 };

/** A window starting at a local New York time (EDT, UTC−4, in June 2026). */
function windowAt(localIso: string, minutes: number, lowest = 0.3, sun = { rise: '06:30', set: '20:25' }): LowWaterWindow {
  const startMs = Date.parse(`${localIso}-04:00`);
  const day = localIso.slice(0, 10);
  return {
    startMs,
    endMs: startMs + minutes * MIN,
    durationMinutes: minutes,
    lowestLevel: lowest,
    lowestAtMs: startMs + (minutes / 2) * MIN,
    date: day,
    sunriseMs: Date.parse(`${day}T${sun.rise}:00-04:00`),
    sunsetMs: Date.parse(`${day}T${sun.set}:00-04:00`),
  };
}

describe('window ranking', () => {
  it('documents default weights that sum to 1', () => {
    const { duration, lowWater, weekend, startHour } = DEFAULT_WINDOW_WEIGHTS;
    expect(duration + lowWater + weekend + startHour).toBeCloseTo(1, 10);
  });

  it('gives full marks to a 4-hour weekend window at 9:00 reaching the band floor', () => {
    expect(scoreWindow(windowAt('2026-06-13T09:00', 240, 0.1), OPTIONS).score).toBe(100);
  });

  it('scores each part as documented (Wednesday 2026-06-10, 2 h from 13:00, lowest 0.30 m)', () => {
    // duration 120/240 = 0.5; lowWater (0.5 − 0.3)/(0.5 − 0.1) = 0.5; weekend 0; start 13:00 is 2 h past 11:00 → 1 − 2/3.
    const want = 0.4 * 0.5 + 0.2 * 0.5 + 0.25 * 0 + 0.15 * (1 / 3);
    expect(scoreWindow(windowAt('2026-06-10T13:00', 120, 0.3), OPTIONS).score).toBeCloseTo(100 * want, 1);
  });

  it('ranks longer, lower, weekend and well-timed windows first', () => {
    const weekdayShort = windowAt('2026-06-10T09:00', 150, 0.4);
    const weekdayLong = windowAt('2026-06-11T09:00', 240, 0.4);
    const weekendLong = windowAt('2026-06-13T09:00', 240, 0.4);
    const weekendLongLower = windowAt('2026-06-14T09:00', 240, 0.15);
    const weekendLongLate = windowAt('2026-06-20T16:00', 240, 0.15);
    const ranked = rankWindows([weekdayShort, weekdayLong, weekendLong, weekendLongLate, weekendLongLower], OPTIONS);
    expect(ranked.map((w) => w.startMs)).toEqual([weekendLongLower, weekendLong, weekendLongLate, weekdayLong, weekdayShort].map((w) => w.startMs));
  });

  it('follows the weights passed in', () => {
    const weekdayLong = windowAt('2026-06-11T09:00', 240);
    const weekendShort = windowAt('2026-06-13T09:00', 120);
    const durationOnly = { duration: 1, lowWater: 0, weekend: 0, startHour: 0 };
    // Defaults: 0.4·1 + 0.2·0.5 + 0.15 = 0.65 for the weekday against 0.4·0.5 + 0.1 + 0.25 + 0.15 = 0.70.
    expect(rankWindows([weekdayLong, weekendShort], OPTIONS)[0]!.startMs).toBe(weekendShort.startMs);
    expect(rankWindows([weekdayLong, weekendShort], { ...OPTIONS, weights: durationOnly })[0]!.startMs).toBe(weekdayLong.startMs);
  });

  it('fades the start-hour mark outside the preferred hours', () => {
    expect(startHourFit(9, [8, 11], 3)).toBe(1);
    expect(startHourFit(6.5, [8, 11], 3)).toBe(0.5);
    expect(startHourFit(15, [8, 11], 3)).toBe(0);
  });
});

describe('window cautions', () => {
  it('flags a start before sunrise (civil twilight)', () => {
    const w = scoreWindow(windowAt('2026-06-13T06:10', 180), OPTIONS);
    expect(w.cautions.map((c) => c.code)).toEqual(['pre-dawn']);
  });

  it('flags a very low tide on soft mud (below MLLW by default), and not on a firm bed', () => {
    const low = windowAt('2026-06-13T09:00', 180, -0.1);
    expect(scoreWindow(low, OPTIONS).cautions.map((c) => c.code)).toEqual(['very-low-tide-soft-mud']);
    expect(scoreWindow(low, { ...OPTIONS, softMudBelow: null }).cautions).toEqual([]);
    expect(scoreWindow(low, { ...OPTIONS, softMudBelow: -0.2 }).cautions).toEqual([]);
  });

  it('flags a window that runs past sunset', () => {
    expect(scoreWindow(windowAt('2026-06-13T18:00', 150), OPTIONS).cautions.map((c) => c.code)).toEqual(['after-sunset']);
  });

  it('words every caution plainly, deferring to local knowledge and never calling a time safe', () => {
    for (const text of Object.values(CAUTION_TEXTS)) {
      expect(text).not.toMatch(/\bsafe/i);
      expect(text).toMatch(/local|know/i);
    }
  });
});
