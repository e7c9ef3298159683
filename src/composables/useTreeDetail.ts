import { ref, watch, type Ref } from 'vue';
import type { MeasurementBody, TreeDetail, UpdateTreeBody } from '@shared/schemas/nursery.schema';
import { fetchTree, recordMeasurement, updateTree } from '@/api/trees';
import { useAsyncAction } from './useAsyncAction';

/** One tree for the drawer, reloaded when the id changes and after each change. */
export function useTreeDetail(id: Ref<string | null>): {
  detail: Ref<TreeDetail | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  /** Resolve to an error message, or null when stored. */
  measure: (body: MeasurementBody) => Promise<string | null>;
  edit: (body: UpdateTreeBody) => Promise<string | null>;
} {
  const detail = ref<TreeDetail | null>(null);
  const { loading, error, run } = useAsyncAction(fetchTree);

  async function reload(): Promise<void> {
    if (!id.value) return;
    const next = await run(id.value);
    if (next) detail.value = next;
  }

  watch(
    id,
    () => {
      detail.value = null;
      void reload();
    },
    { immediate: true },
  );

  /** Runs one write for the open tree, then reloads it so history and growth include the change. */
  async function write(action: (treeId: string) => Promise<unknown>, messages: Record<string, string>): Promise<string | null> {
    if (!id.value) return 'No tree is open.';
    const treeId = id.value;
    const save = useAsyncAction(() => action(treeId), messages);
    await save.run();
    if (save.error.value) return save.error.value;
    await reload();
    return null;
  }

  const measure = (body: MeasurementBody) => write((treeId) => recordMeasurement(treeId, body), { validation_failed: 'Check the height and leaf count.' });
  const edit = (body: UpdateTreeBody) => write((treeId) => updateTree(treeId, body), { validation_failed: 'Check the pot height and mass.' });

  return { detail, loading, error, reload, measure, edit };
}
