import { reactive, ref, type Ref } from 'vue';
import { ApiError } from '@/api/http';
import { fetchCurrentWaiver, type Waiver } from '@/api/signups';
import { PublishWaiverBody, publishWaiver } from '@/api/waiver-admin';
import { useAsyncAction } from './useAsyncAction';
import { useFormSubmit } from './useFormSubmit';

export interface WaiverAdmin {
  /** The current version; null before the first is published. */
  current: Ref<Waiver | null>;
  loading: Ref<boolean>;
  loadError: Ref<string | null>;
  reload: () => Promise<void>;
  form: { text: string; guardianText: string };
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  publishing: Ref<boolean>;
  /** Resolves to the version just published, or null when it was not (the errors say why). */
  publish: () => Promise<Waiver | null>;
}

/** The waiver page for admins: the current text, and a new version started from it. */
export function useWaiverAdmin(): WaiverAdmin {
  const current = ref<Waiver | null>(null);
  const form = reactive({ text: '', guardianText: '' });

  const { loading, error: loadError, run } = useAsyncAction(async () => {
    try {
      return await fetchCurrentWaiver();
    } catch (err) {
      if (err instanceof ApiError && err.status === 404) return null;
      throw err;
    }
  });

  function show(waiver: Waiver | null): void {
    current.value = waiver;
    form.text = waiver?.text ?? '';
    form.guardianText = waiver?.guardianText ?? '';
  }

  async function reload(): Promise<void> {
    const waiver = await run();
    if (waiver !== undefined) show(waiver);
  }

  const published = ref<Waiver | null>(null);
  const { fieldErrors, formError, submitting, submit } = useFormSubmit(PublishWaiverBody, async (body) => {
    published.value = await publishWaiver(body);
  }, { messages: { forbidden: 'Only admins can publish the waiver.' } });

  async function publish(): Promise<Waiver | null> {
    published.value = null;
    if (!(await submit({ ...form }))) return null;
    show(published.value);
    return published.value;
  }

  return { current, loading, loadError, reload, form, fieldErrors, formError, publishing: submitting, publish };
}
