import { ref, type Ref } from 'vue';
import type { TreeRow } from '@shared/schemas/nursery.schema';
import { listTrees } from '@/api/trees';
import { useAsyncAction } from './useAsyncAction';

const SHOWN = 8;

/** Nursery trees whose tag contains what was typed, for adding a tree the day planted without a reservation. */
export function usePlantingSearch(): { text: Ref<string>; found: Ref<TreeRow[] | null>; searching: Ref<boolean>; error: Ref<string | null>; search: () => Promise<void> } {
  const text = ref('');
  const found = ref<TreeRow[] | null>(null);
  const { loading: searching, error, run } = useAsyncAction(listTrees);

  async function search(): Promise<void> {
    const q = text.value.trim();
    if (!q) return;
    const page = await run({ stage: '', tankId: '', q, page: 1, pageSize: SHOWN });
    if (page) found.value = page.trees;
  }

  return { text, found, searching, error, search };
}
