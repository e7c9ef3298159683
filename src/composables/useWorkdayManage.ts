import { ref, watch, type Ref } from 'vue';
import { CancelWorkdayBody, type WorkdayDto } from '@shared/schemas/workday.schema';
import { cancelWorkday, completeWorkday, fetchWorkday, publishWorkday } from '@/api/workdays';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';
import { useFormSubmit, type FormSubmit } from './useFormSubmit';

export interface WorkdayManage {
  workday: Ref<WorkdayDto | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  /** The step running now, for its button's spinner. */
  acting: Ref<'publish' | 'complete' | null>;
  /** Resolve to null on success, or to the message to show. */
  publish: () => Promise<string | null>;
  complete: () => Promise<string | null>;
  /** The cancel dialog's form: the message the crew is e-mailed. */
  cancelling: Pick<FormSubmit, 'fieldErrors' | 'formError' | 'submitting'> & { submit: (message: string) => Promise<boolean> };
}

const CONFLICT = { conflict: 'Someone changed this workday meanwhile. Reload the page to see where it stands.' };

/** One workday for its coordinator: load it, publish, cancel with a message to the crew, mark it completed. */
export function useWorkdayManage(id: Ref<string>): WorkdayManage {
  const workday = ref<WorkdayDto | null>(null);
  const acting = ref<'publish' | 'complete' | null>(null);
  const { loading, error, run } = useAsyncAction(fetchWorkday, { not_found: "This workday wasn't found. It may have been removed." });

  async function reload(): Promise<void> {
    const next = await run(id.value);
    if (next) workday.value = next;
  }
  watch(id, () => {
    workday.value = null;
    void reload();
  }, { immediate: true });

  async function step(name: 'publish' | 'complete', action: (id: string) => Promise<WorkdayDto>): Promise<string | null> {
    acting.value = name;
    try {
      workday.value = await action(id.value);
      return null;
    } catch (err) {
      return errorMessage(err, CONFLICT);
    } finally {
      acting.value = null;
    }
  }

  const form = useFormSubmit(CancelWorkdayBody, async (body) => {
    workday.value = await cancelWorkday(id.value, body.message);
  }, { messages: CONFLICT });

  return {
    workday,
    loading,
    error,
    reload,
    acting,
    publish: () => step('publish', publishWorkday),
    complete: () => step('complete', completeWorkday),
    cancelling: { ...form, submit: (message: string) => form.submit({ message }) },
  };
}
