import { ref, watch, type Ref } from 'vue';
import type { Site } from '@shared/schemas/site.schema';
import { fetchSite } from '@/api/sites';
import { useAsyncAction } from './useAsyncAction';

/** One site, reloaded whenever `id` changes. */
export function useSite(id: Ref<string>): { site: Ref<Site | null>; loading: Ref<boolean>; error: Ref<string | null>; reload: () => Promise<void> } {
  const site = ref<Site | null>(null);
  const { loading, error, run } = useAsyncAction(fetchSite, { not_found: "This site wasn't found. It may have been removed." });
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const next = await run(id.value);
    if (ticket === latest && next) site.value = next;
  }

  watch(id, () => {
    site.value = null;
    void reload();
  }, { immediate: true });

  return { site, loading, error, reload };
}
