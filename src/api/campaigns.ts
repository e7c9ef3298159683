import { z } from 'zod';
import {
  Campaign,
  CampaignPage,
  ManagedCampaign,
  type CreateCampaignBody,
  type UpdateCampaignBody,
} from '@shared/schemas/campaign.schema';
import { get, patch, post } from './http';

export type { Campaign, CampaignPage, ManagedCampaign };

const CampaignsResponse = z.object({ campaigns: z.array(Campaign) });
const ManagedCampaignsResponse = z.object({ campaigns: z.array(ManagedCampaign) });
const ManagedCampaignResponse = z.object({ campaign: ManagedCampaign });

const campaignPath = (id: string) => `/api/campaigns/${encodeURIComponent(id)}`;

/** Anyone: the campaigns taking gifts today. */
export async function listOpenCampaigns(): Promise<Campaign[]> {
  return (await get('/api/campaigns', CampaignsResponse)).campaigns;
}

/** Anyone: one campaign with its progress, donor wall, currency and the card fee a donor may cover. */
export function fetchCampaignPage(id: string): Promise<CampaignPage> {
  return get(campaignPath(id), CampaignPage);
}

/** Admins: every campaign, open or not, with what it has raised. */
export async function listManagedCampaigns(): Promise<ManagedCampaign[]> {
  return (await get('/api/campaigns/manage', ManagedCampaignsResponse)).campaigns;
}

/** Admins. */
export async function createCampaign(body: CreateCampaignBody): Promise<ManagedCampaign> {
  return (await post('/api/campaigns', body, ManagedCampaignResponse)).campaign;
}

/** Admins; send just the fields that changed. */
export async function updateCampaign(id: string, body: UpdateCampaignBody): Promise<ManagedCampaign> {
  return (await patch(campaignPath(id), body, ManagedCampaignResponse)).campaign;
}
