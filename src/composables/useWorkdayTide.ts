import { computed, ref, watch, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { fetchSiteTide, type SiteTide } from '@/api/tide';
import { workdayDaySpan } from '@/utils/workday-format';
import { useAsyncAction } from './useAsyncAction';

/**
 * The tide at a workday's site over its local day (midnight to midnight), for signed-in people
 * (the tide API needs a session). `units` is null until the organisation is known.
 */
export function useWorkdayTide(workday: Ref<Pick<WorkdayDto, 'id' | 'siteId' | 'startsAt' | 'endsAt' | 'site'> | null>, units: Ref<LengthUnit | null>, signedIn: Ref<boolean>): {
  tide: Ref<SiteTide | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
} {
  const tide = ref<SiteTide | null>(null);
  const { loading, error, run } = useAsyncAction(fetchSiteTide);
  const key = computed(() => (workday.value ? `${workday.value.siteId}|${workday.value.startsAt}` : null));
  let latest = 0;

  async function reload(): Promise<void> {
    const w = workday.value;
    if (!w || !units.value || !signedIn.value) return;
    const ticket = ++latest;
    const next = await run(w.siteId, workdayDaySpan(w), units.value);
    if (ticket === latest && next) tide.value = next;
  }

  watch([key, units, signedIn], () => {
    tide.value = null;
    void reload();
  }, { immediate: true });

  return { tide, loading, error, reload };
}
