import { ref, type Ref } from 'vue';
import { errorMessage, type ErrorMessages } from '@/utils/error-message';

export interface AsyncAction<A extends unknown[], T> {
  loading: Ref<boolean>;
  error: Ref<string | null>;
  /** Resolves to the result, or to undefined after a failure (the message is in `error`). */
  run: (...args: A) => Promise<T | undefined>;
}

/** Loading and error state around one async call; the loading flag is always reset in `finally`. */
export function useAsyncAction<A extends unknown[], T>(
  action: (...args: A) => Promise<T>,
  messages: ErrorMessages = {},
): AsyncAction<A, T> {
  const loading = ref(false);
  const error = ref<string | null>(null);

  async function run(...args: A): Promise<T | undefined> {
    loading.value = true;
    error.value = null;
    try {
      return await action(...args);
    } catch (err) {
      error.value = errorMessage(err, messages);
      return undefined;
    } finally {
      loading.value = false;
    }
  }

  return { loading, error, run };
}
