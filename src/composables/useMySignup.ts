import { ref, watch, type Ref } from 'vue';
import type { SignupResult } from '@shared/schemas/crew.schema';
import { cancelMySignup, fetchMySignup } from '@/api/signups';
import { useAsyncAction } from './useAsyncAction';

export interface MySignup {
  /** My place on the workday, or null when I have none (or am signed out). */
  mine: Ref<SignupResult | null>;
  loaded: Ref<boolean>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  cancelling: Ref<boolean>;
  cancelError: Ref<string | null>;
  /** Resolves true when the place was given up. */
  cancel: () => Promise<boolean>;
}

/** The signed-in person's place on one workday, and giving it up. Nothing loads while signed out. */
export function useMySignup(workdayId: Ref<string>, signedIn: Ref<boolean>): MySignup {
  const mine = ref<SignupResult | null>(null);
  const loaded = ref(false);
  const { loading, error, run } = useAsyncAction(fetchMySignup);
  const { loading: cancelling, error: cancelError, run: runCancel } = useAsyncAction(cancelMySignup, {
    conflict: 'This workday has started, so your place can no longer be cancelled here. Tell the coordinator at the launch instead.',
    not_found: 'You had no place on this workday any more.',
  });

  async function reload(): Promise<void> {
    if (!signedIn.value) {
      mine.value = null;
      loaded.value = true;
      return;
    }
    const id = workdayId.value;
    const next = await run(id);
    if (id !== workdayId.value || next === undefined) return;
    mine.value = next;
    loaded.value = true;
  }

  async function cancel(): Promise<boolean> {
    await runCancel(workdayId.value);
    // cancelMySignup resolves to nothing, so success is the absence of an error.
    if (cancelError.value !== null) return false;
    mine.value = null;
    return true;
  }

  watch([workdayId, signedIn], () => {
    loaded.value = false;
    void reload();
  }, { immediate: true });

  return { mine, loaded, loading, error, reload, cancelling, cancelError, cancel };
}
