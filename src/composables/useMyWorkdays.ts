import { computed, ref, type ComputedRef, type Ref } from 'vue';
import { fetchMyWorkdays, type MyWorkday } from '@/api/me';
import { useAsyncAction } from './useAsyncAction';

export interface MyWorkdays {
  all: Ref<MyWorkday[] | null>;
  /** Not yet over, soonest first. */
  upcoming: ComputedRef<MyWorkday[]>;
  /** Over, most recent first. */
  past: ComputedRef<MyWorkday[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/** The workdays I'm on or waiting for, split at `now` by when each one ends. */
export function useMyWorkdays(now: number = Date.now()): MyWorkdays {
  const all = ref<MyWorkday[] | null>(null);
  const { loading, error, run } = useAsyncAction(fetchMyWorkdays);
  const upcoming = computed(() =>
    (all.value ?? []).filter((m) => Date.parse(m.workday.endsAt) > now).sort((a, b) => a.workday.startsAt.localeCompare(b.workday.startsAt)),
  );
  const past = computed(() =>
    (all.value ?? []).filter((m) => Date.parse(m.workday.endsAt) <= now).sort((a, b) => b.workday.startsAt.localeCompare(a.workday.startsAt)),
  );

  async function reload(): Promise<void> {
    const next = await run();
    if (next) all.value = next;
  }

  return { all, upcoming, past, loading, error, reload };
}
