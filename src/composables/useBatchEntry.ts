import { reactive, ref, type Ref } from 'vue';
import { BatchInfoBody, type ImportPreview, type PhotoDto } from '@shared/schemas/nursery.schema';
import { commitImport, createBatch, previewImport, type CreatedBatch } from '@/api/trees';
import { errorMessage } from '@/utils/error-message';
import { numberOrUndefined } from '@/utils/nursery';

export interface BatchForm {
  collectedOn: string;
  place: string;
  latitude: string;
  longitude: string;
  collector: string;
  notes: string;
  count: string;
  csv: string;
  /** Uploaded as soon as it is chosen; the batch keeps its id. */
  photo: PhotoDto | null;
}

/** A new collection batch, typed (count of fresh trees) or imported from CSV after a preview. */
export function useBatchEntry(): {
  form: BatchForm;
  created: Ref<CreatedBatch | null>;
  preview: Ref<ImportPreview | null>;
  busy: Ref<boolean>;
  error: Ref<string | null>;
  create: () => Promise<void>;
  check: () => Promise<void>;
  commit: () => Promise<void>;
} {
  const form = reactive<BatchForm>({ collectedOn: '', place: '', latitude: '', longitude: '', collector: '', notes: '', count: '10', csv: '', photo: null });
  const created = ref<CreatedBatch | null>(null);
  const preview = ref<ImportPreview | null>(null);
  const messages = { validation_failed: 'Check the batch details: date and place are needed, and both coordinates or neither.' };
  const busy = ref(false);
  const error = ref<string | null>(null);

  // One busy flag and message for the three calls, reset in finally like useAsyncAction.
  async function attempt<T>(fn: () => Promise<T>): Promise<T | undefined> {
    busy.value = true;
    error.value = null;
    try {
      return await fn();
    } catch (err) {
      error.value = errorMessage(err, messages);
      return undefined;
    } finally {
      busy.value = false;
    }
  }

  function info() {
    return {
      collectedOn: form.collectedOn,
      place: form.place,
      latitude: numberOrUndefined(form.latitude),
      longitude: numberOrUndefined(form.longitude),
      collector: form.collector,
      notes: form.notes,
      ...(form.photo && { photoId: form.photo.id }),
    };
  }

  function checkInfo(): boolean {
    error.value = null;
    const parsed = BatchInfoBody.safeParse(info());
    if (!parsed.success) error.value = messages.validation_failed;
    return parsed.success;
  }

  async function create(): Promise<void> {
    created.value = null;
    if (!checkInfo()) return;
    const count = numberOrUndefined(form.count) ?? 0;
    const out = await attempt(() => createBatch({ ...info(), count }));
    if (out) created.value = out;
  }

  async function check(): Promise<void> {
    preview.value = null;
    created.value = null;
    if (!checkInfo()) return;
    const out = await attempt(() => previewImport({ batch: info(), csv: form.csv }));
    if (out) preview.value = out;
  }

  async function commit(): Promise<void> {
    if (!preview.value?.valid) return;
    const out = await attempt(() => commitImport({ batch: info(), csv: form.csv }));
    if (!out) return;
    created.value = out;
    preview.value = null;
  }

  return { form, created, preview, busy, error, create, check, commit };
}
