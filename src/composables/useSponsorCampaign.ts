import { ref, watch, type Ref } from 'vue';
import { fetchCampaignPage, listOpenCampaigns, type Campaign, type CampaignPage } from '@/api/campaigns';
import { useAsyncAction } from './useAsyncAction';

export interface SponsorCampaign {
  page: Ref<CampaignPage | null>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/** The public campaign page (campaign, progress, donor wall, card fee), reloaded when `id` changes. */
export function useSponsorCampaign(id: Ref<string>): SponsorCampaign {
  const page = ref<CampaignPage | null>(null);
  const { error, run } = useAsyncAction(fetchCampaignPage, {
    not_found: "This campaign wasn't found. It may have ended; the campaigns open now are on the sponsor page.",
    validation_failed: "This link doesn't point to a campaign. The campaigns open now are on the sponsor page.",
  });
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const next = await run(id.value);
    if (ticket === latest && next) page.value = next;
  }

  watch(id, () => {
    page.value = null;
    void reload();
  }, { immediate: true });

  return { page, error, reload };
}

export interface SponsorCampaigns {
  campaigns: Ref<Campaign[] | null>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/** The campaigns taking gifts today, for the sponsor landing page. */
export function useSponsorCampaigns(): SponsorCampaigns {
  const campaigns = ref<Campaign[] | null>(null);
  const { error, run } = useAsyncAction(listOpenCampaigns);

  async function reload(): Promise<void> {
    const next = await run();
    if (next) campaigns.value = next;
  }

  void reload();
  return { campaigns, error, reload };
}
