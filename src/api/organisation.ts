import { z } from 'zod';
import {
  OrganisationSettings,
  PublicOrganisation,
  type UpdateOrganisationBody,
} from '@shared/schemas/organisation.schema';
import { get, patch } from './http';

const OrganisationResponse = z.object({ organisation: PublicOrganisation });
const SettingsResponse = z.object({ settings: OrganisationSettings });

/** Anyone, signed in or not: the name, the demo marker, display units and time zone. */
export async function fetchOrganisation(): Promise<PublicOrganisation> {
  return (await get('/api/organisation', OrganisationResponse)).organisation;
}

/** Admin only: everything the settings page edits. */
export async function fetchOrganisationSettings(): Promise<OrganisationSettings> {
  return (await get('/api/organisation/settings', SettingsResponse)).settings;
}

/** Admin only; send just the fields that changed. */
export async function updateOrganisationSettings(body: UpdateOrganisationBody): Promise<OrganisationSettings> {
  return (await patch('/api/organisation/settings', body, SettingsResponse)).settings;
}
