import { ref, type Ref } from 'vue';
import type { Site } from '@shared/schemas/site.schema';
import { listSites } from '@/api/sites';
import { useAsyncAction } from './useAsyncAction';

/** The list of sites, for the sites page. */
export function useSites(): { sites: Ref<Site[]>; loading: Ref<boolean>; error: Ref<string | null>; reload: () => Promise<void> } {
  const sites = ref<Site[]>([]);
  const { loading, error, run } = useAsyncAction(listSites);

  async function reload(): Promise<void> {
    const rows = await run();
    if (rows) sites.value = rows;
  }

  return { sites, loading, error, reload };
}
