/** Shared helpers for the tide tests: fixtures, matching published extremes, hand-built stations. */
import { readFileSync } from 'node:fs';
import type { TideExtreme, TideStation } from '../../../server/domain/tide/types.js';

/** Reads a JSON fixture from tests/fixtures/tide/ (copied there from the shared reference). */
export function readFixture<T>(name: string): T {
  return JSON.parse(readFileSync(new URL(`../../fixtures/tide/${name}`, import.meta.url), 'utf8')) as T;
}

export interface PublishedExtreme {
  timeUtc: string;
  type: 'high' | 'low';
  height: number;
  source: string;
}

export interface HiloFixture {
  sources: Record<string, string>;
  station: string;
  unit: 'ft';
  datum: 'MLLW';
  extremes: PublishedExtreme[];
}

export interface Match {
  published: PublishedExtreme;
  predicted: TideExtreme | null;
  minutesOff: number;
  heightOff: number;
}

/**
 * Pairs each published extreme with the nearest predicted extreme of the same type within
 * `windowMinutes`, each predicted extreme used at most once.
 */
export function matchExtremes(published: readonly PublishedExtreme[], predicted: readonly TideExtreme[], windowMinutes = 60): Match[] {
  const used = new Set<number>();
  return published.map((p) => {
    const t = Date.parse(p.timeUtc);
    let best = -1;
    let bestOff = windowMinutes * 60_000;
    predicted.forEach((e, i) => {
      const off = Math.abs(e.timeMs - t);
      if (e.type === p.type && !used.has(i) && off <= bestOff) {
        best = i;
        bestOff = off;
      }
    });
    if (best < 0) return { published: p, predicted: null, minutesOff: Number.POSITIVE_INFINITY, heightOff: Number.POSITIVE_INFINITY };
    used.add(best);
    const e = predicted[best]!;
    return { published: p, predicted: e, minutesOff: bestOff / 60_000, heightOff: Math.abs(e.height - p.height) };
  });
}

/** The q-quantile (nearest rank) of a list of numbers. */
export function quantile(values: readonly number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.max(0, Math.ceil(q * sorted.length) - 1)] ?? Number.NaN;
}

/** A hand-built (invented) reference station: given constituents, MLLW 1 m and MSL 1.5 m above STND. */
export function handBuiltStation(overrides: Partial<TideStation> = {}): TideStation {
  return {
    id: 'test/hand-built',
    name: 'Hand-built test station (invented)',
    latitude: 27.99,
    longitude: -82.69,
    timeZone: 'America/New_York',
    kind: 'reference',
    constituents: [{ name: 'M2', amplitude: 0.4, phase: 0 }],
    datums: { STND: 0, MLLW: 1, MLW: 1.1, MSL: 1.5, MHW: 1.9, MHHW: 2, GT: 1 },
    chartDatum: 'MLLW',
    source: { name: 'invented', id: 'hand-built', url: 'https://example.invalid' },
    licence: { type: 'test', url: 'https://example.invalid', commercialUse: true },
    attribution: 'invented test data',
    ...overrides,
  };
}
