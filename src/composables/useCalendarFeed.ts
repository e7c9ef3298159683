import { ref, type Ref } from 'vue';
import { createFeedUrl, fetchFeedUrl, revokeFeed } from '@/api/calendar';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

export interface CalendarFeed {
  url: Ref<string | null>;
  loaded: Ref<boolean>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  /** The change running now, for its button's spinner. */
  busy: Ref<'create' | 'revoke' | null>;
  actionError: Ref<string | null>;
  /** Makes a feed address, or replaces the current one (the old one stops working). */
  create: () => Promise<void>;
  revoke: () => Promise<void>;
}

/** My personal calendar feed: its secret address, made, replaced or switched off. */
export function useCalendarFeed(): CalendarFeed {
  const url = ref<string | null>(null);
  const loaded = ref(false);
  const busy = ref<'create' | 'revoke' | null>(null);
  const actionError = ref<string | null>(null);
  const { loading, error, run } = useAsyncAction(fetchFeedUrl);

  async function reload(): Promise<void> {
    const next = await run();
    if (next === undefined) return;
    url.value = next;
    loaded.value = true;
  }

  async function change(kind: 'create' | 'revoke', action: () => Promise<string | null>): Promise<void> {
    busy.value = kind;
    actionError.value = null;
    try {
      url.value = await action();
    } catch (err) {
      actionError.value = errorMessage(err);
    } finally {
      busy.value = null;
    }
  }

  return {
    url,
    loaded,
    loading,
    error,
    reload,
    busy,
    actionError,
    create: () => change('create', createFeedUrl),
    revoke: () => change('revoke', async () => {
      await revokeFeed();
      return null;
    }),
  };
}
