import { computed, ref, watch, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { fetchWorkdayTide, type WorkdayDayTide } from '@/api/tide';
import { useAsyncAction } from './useAsyncAction';

/**
 * The tide at a workday's site over its local day (midnight to midnight); public, like the
 * workday page. `units` is null until the organisation is known.
 */
export function useWorkdayTide(workday: Ref<Pick<WorkdayDto, 'id' | 'siteId' | 'startsAt' | 'endsAt' | 'site'> | null>, units: Ref<LengthUnit | null>): {
  tide: Ref<WorkdayDayTide | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
} {
  const tide = ref<WorkdayDayTide | null>(null);
  const { loading, error, run } = useAsyncAction(fetchWorkdayTide);
  const key = computed(() => (workday.value ? `${workday.value.id}|${workday.value.startsAt}` : null));
  let latest = 0;

  async function reload(): Promise<void> {
    const w = workday.value;
    if (!w || !units.value) return;
    const ticket = ++latest;
    const next = await run(w.id, units.value);
    if (ticket === latest && next) tide.value = next;
  }

  watch([key, units], () => {
    tide.value = null;
    void reload();
  }, { immediate: true });

  return { tide, loading, error, reload };
}
