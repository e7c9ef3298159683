import { ref, watch, type Ref } from 'vue';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { fetchWorkday } from '@/api/workdays';
import { useAsyncAction } from './useAsyncAction';

export interface WorkdayPage {
  workday: Ref<WorkdayDto | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/** The public workday page's workday, reloaded when `id` changes and after a sign-up or cancellation. */
export function useWorkdayPage(id: Ref<string>): WorkdayPage {
  const workday = ref<WorkdayDto | null>(null);
  const { loading, error, run } = useAsyncAction(fetchWorkday, {
    not_found: "This workday wasn't found. It may have been removed, or not be published yet.",
  });
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const next = await run(id.value);
    if (ticket === latest && next) workday.value = next;
  }

  watch(id, () => {
    workday.value = null;
    void reload();
  }, { immediate: true });

  return { workday, loading, error, reload };
}
