import { ref, watch, type Ref } from 'vue';
import type { MeasurementBody, TreeDetail } from '@shared/schemas/nursery.schema';
import { fetchTree, recordMeasurement, uploadPhoto } from '@/api/trees';
import { useAsyncAction } from './useAsyncAction';

/** One tree for the drawer, reloaded when the id changes and after a measurement. */
export function useTreeDetail(id: Ref<string | null>): {
  detail: Ref<TreeDetail | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  measure: (body: MeasurementBody, photo: File | null) => Promise<string | null>;
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

  /** Uploads the photo first (if any); resolves to an error message, or null when stored. */
  async function measure(body: MeasurementBody, photo: File | null): Promise<string | null> {
    if (!id.value) return 'No tree is open.';
    const treeId = id.value;
    const save = useAsyncAction(async () => {
      const photoId = photo ? (await uploadPhoto(photo)).id : undefined;
      await recordMeasurement(treeId, photoId ? { ...body, photoId } : body);
    }, { payload_too_large: 'That photo is too large.' });
    await save.run();
    if (save.error.value) return save.error.value;
    await reload();
    return null;
  }

  return { detail, loading, error, reload, measure };
}
