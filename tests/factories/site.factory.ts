import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { Site } from '../../server/db/entities/site.entity.js';

/**
 * A site in Old Tampa Bay tied to the real NOAA station Safety Harbor (noaa/8726738);
 * the site itself and its depths are invented test data.
 */
export function siteBody(overrides: Partial<Site> = {}) {
  return {
    name: `Test shore ${randomBytes(4).toString('hex')}`,
    latitude: 27.99,
    longitude: -82.69,
    timeZone: 'America/New_York',
    stationId: 'noaa/8726738',
    bedElevationM: 0.2,
    routeElevationM: -0.15,
    workingDepthM: 0.45,
    craftDraftM: 0.15,
    draftMarginM: 0.08,
    launchName: 'Test launch',
    launchDistanceM: 900,
    ...overrides,
  };
}

export async function buildSite(db: DataSource, overrides: Partial<Site> = {}): Promise<Site> {
  const repo = db.getRepository(Site);
  return repo.save(repo.create(siteBody(overrides)));
}
