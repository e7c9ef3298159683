import { z } from 'zod';
import { Site, type CreateSiteBody, type UpdateSiteBody } from '@shared/schemas/site.schema';
import { get, patch, post } from './http';

const SitesResponse = z.object({ sites: z.array(Site) });
const SiteResponse = z.object({ site: Site });

function sitePath(id: string): string {
  return `/api/sites/${encodeURIComponent(id)}`;
}

/** Everyone signed in. */
export async function listSites(): Promise<Site[]> {
  return (await get('/api/sites', SitesResponse)).sites;
}

/** Everyone signed in. */
export async function fetchSite(id: string): Promise<Site> {
  return (await get(sitePath(id), SiteResponse)).site;
}

/** Coordinators and admins; 409 `conflict` (fields.name) when the name is taken. */
export async function createSite(body: CreateSiteBody): Promise<Site> {
  return (await post('/api/sites', body, SiteResponse)).site;
}

/** Coordinators and admins; send only the fields that changed. */
export async function updateSite(id: string, body: UpdateSiteBody): Promise<Site> {
  return (await patch(sitePath(id), body, SiteResponse)).site;
}
