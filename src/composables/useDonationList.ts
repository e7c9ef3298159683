import { onBeforeUnmount, reactive, ref, type Ref } from 'vue';
import { listManagedCampaigns, type Campaign } from '@/api/campaigns';
import { listDonations, refundDonation, type DonationQuery, type DonationRow, type DonationTotals } from '@/api/donations';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

const REFUND_RECHECK_MS = 2000;

export interface DonationList {
  query: DonationQuery;
  items: Ref<DonationRow[]>;
  total: Ref<number>;
  totals: Ref<DonationTotals | null>;
  campaigns: Ref<Campaign[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  /** Back to page 1 after a filter changes. */
  search: () => Promise<void>;
  refundingId: Ref<string | null>;
  /** Resolves to null when the refund was asked for, or to the message to show. */
  refund: (row: DonationRow) => Promise<string | null>;
}

/** The admin's donations: filters, one page of rows, the totals of all that match, and refunds. */
export function useDonationList(initial: Partial<DonationQuery> = {}, pageSize = 25): DonationList {
  const query = reactive<DonationQuery>({ from: '', to: '', campaignId: '', status: '', q: '', page: 1, pageSize, ...initial });
  const items = ref<DonationRow[]>([]);
  const total = ref(0);
  const totals = ref<DonationTotals | null>(null);
  const campaigns = ref<Campaign[]>([]);
  const refundingId = ref<string | null>(null);
  const list = useAsyncAction(listDonations, { validation_failed: 'Check the dates: the first must not be after the second.' });
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const page = await list.run({ ...query });
    // A slower, older request must not overwrite a newer one.
    if (!page || ticket !== latest) return;
    items.value = page.items;
    total.value = page.total;
    totals.value = page.totals;
  }

  async function search(): Promise<void> {
    query.page = 1;
    await reload();
  }

  // The campaign filter's choices; the list works without them.
  void listManagedCampaigns().then((all) => (campaigns.value = all)).catch(() => undefined);

  let recheck: ReturnType<typeof setTimeout> | undefined;
  onBeforeUnmount(() => clearTimeout(recheck));

  async function refund(row: DonationRow): Promise<string | null> {
    refundingId.value = row.id;
    try {
      await refundDonation(row.id);
      await reload();
      // The provider confirms the refund by webhook, usually within a moment: look once more.
      clearTimeout(recheck);
      recheck = setTimeout(() => void reload(), REFUND_RECHECK_MS);
      return null;
    } catch (err) {
      return errorMessage(err, { conflict: 'This gift was already refunded.' });
    } finally {
      refundingId.value = null;
    }
  }

  return { query, items, total, totals, campaigns, loading: list.loading, error: list.error, reload, search, refundingId, refund };
}

/** "In memory of Ada Reyes", or '' when the gift carries no dedication. */
export function dedicationText(row: Pick<DonationRow, 'dedication'>): string {
  if (!row.dedication) return '';
  return `${row.dedication.kind === 'honour' ? 'In honour of' : 'In memory of'} ${row.dedication.name}`;
}
