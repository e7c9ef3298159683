/** Plantings grouped by site and planting date, with the bed elevations they went in at (pure). */

export interface PlantedAt {
  siteId: string;
  siteName: string;
  stationId: string;
  plantedOn: string;
  /** Metres above the site tide station's MLLW; null when not recorded. */
  bedElevationM: number | null;
}

export interface PlantingDayRow {
  siteId: string;
  siteName: string;
  stationId: string;
  plantedOn: string;
  trees: number;
  /** Lowest, highest and mean recorded bed elevation (m above MLLW); null when none recorded. */
  minM: number | null;
  maxM: number | null;
  meanM: number | null;
}

/**
 * One row per site and planting date, by site name then date.
 * @example plantingDays([{ siteId: 's', siteName: 'Heron Reach', stationId: 'noaa/8726738', plantedOn: '2026-03-10', bedElevationM: 0.3 }])
 *   // [{ …, trees: 1, minM: 0.3, maxM: 0.3, meanM: 0.3 }]
 */
export function plantingDays(trees: readonly PlantedAt[]): PlantingDayRow[] {
  const groups = new Map<string, PlantedAt[]>();
  for (const t of trees) {
    const key = `${t.siteId}|${t.plantedOn}`;
    groups.set(key, [...(groups.get(key) ?? []), t]);
  }
  return [...groups.values()]
    .map((g) => {
      const elevations = g.flatMap((t) => (t.bedElevationM === null ? [] : [t.bedElevationM]));
      const first = g[0]!;
      return {
        siteId: first.siteId, siteName: first.siteName, stationId: first.stationId, plantedOn: first.plantedOn, trees: g.length,
        minM: elevations.length ? Math.min(...elevations) : null,
        maxM: elevations.length ? Math.max(...elevations) : null,
        meanM: elevations.length ? Math.round((elevations.reduce((a, b) => a + b, 0) / elevations.length) * 1000) / 1000 : null,
      };
    })
    .sort((a, b) => a.siteName.localeCompare(b.siteName) || (a.plantedOn < b.plantedOn ? -1 : a.plantedOn > b.plantedOn ? 1 : 0));
}
