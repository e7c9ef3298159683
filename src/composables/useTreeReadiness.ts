import { ref, watch, type Ref } from 'vue';
import type { TreeReadinessDto } from '@shared/schemas/nursery.schema';
import { fetchTreeReadiness } from '@/api/trees';
import { useAsyncAction } from './useAsyncAction';

/**
 * One tree judged for the chosen site; judged again when the tree, the site or the tree's
 * `version` (its last update) changes. Nothing is asked until a site is chosen.
 */
export function useTreeReadiness(treeId: Ref<string | null>, siteId: Ref<string>, version: Ref<string> = ref('')): {
  result: Ref<TreeReadinessDto | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
} {
  const result = ref<TreeReadinessDto | null>(null);
  const { loading, error, run } = useAsyncAction(fetchTreeReadiness, { validation_failed: 'Choose a site to judge this tree for.' });

  async function reload(): Promise<void> {
    result.value = null;
    error.value = null;
    if (!treeId.value || !siteId.value) return;
    const asked = `${treeId.value}/${siteId.value}`;
    const out = await run(treeId.value, siteId.value);
    // A slower answer for a site chosen before must not overwrite the one for the current site.
    if (out && asked === `${treeId.value}/${siteId.value}`) result.value = out;
  }

  watch([treeId, siteId, version], () => void reload(), { immediate: true });
  return { result, loading, error, reload };
}
