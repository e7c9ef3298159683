import { computed, ref, watch, type ComputedRef, type Ref } from 'vue';
import type { ReadinessDto, SiteReadinessDto } from '@shared/schemas/nursery.schema';
import { fetchSiteReadiness } from '@/api/trees';
import { useAsyncAction } from './useAsyncAction';

/** Every tree the server judges (potted, brining, ready) against the chosen site, by tree id; empty while no site is chosen. */
export function useSiteReadiness(siteId: Ref<string>): {
  result: Ref<SiteReadinessDto | null>;
  byTree: ComputedRef<Map<string, ReadinessDto>>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
} {
  const result = ref<SiteReadinessDto | null>(null);
  const { loading, error, run } = useAsyncAction(fetchSiteReadiness);
  const byTree = computed(() => new Map((result.value?.trees ?? []).map((t) => [t.treeId, t])));

  async function reload(): Promise<void> {
    const asked = siteId.value;
    result.value = null;
    error.value = null;
    if (!asked) return;
    const out = await run(asked);
    if (out && asked === siteId.value) result.value = out;
  }

  watch(siteId, () => void reload());
  return { result, byTree, loading, error, reload };
}
