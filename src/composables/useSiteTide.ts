import { computed, ref, watch, type ComputedRef, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { Site } from '@shared/schemas/site.schema';
import { fetchSiteTide, type SiteTide, type Span } from '@/api/tide';
import { addDays, zonedTime, type DateKey } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

export interface SiteTideState {
  tide: Ref<SiteTide | null>;
  /** The week asked for: local midnight of `weekStart` to local midnight seven days later. */
  span: ComputedRef<Span | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/**
 * A week of tide for the tide board, in the site's zone, reloaded when the site, week or units change.
 * `units` is null until the organisation is known, so nothing is fetched twice.
 */
export function useSiteTide(site: Ref<Site | null>, weekStart: Ref<DateKey | null>, units: Ref<LengthUnit | null>): SiteTideState {
  const tide = ref<SiteTide | null>(null);
  const span = computed<Span | null>(() => {
    if (!site.value || !weekStart.value) return null;
    const tz = site.value.timeZone;
    return { from: zonedTime(weekStart.value, tz).toISOString(), to: zonedTime(addDays(weekStart.value, 7), tz).toISOString() };
  });
  const { loading, error, run } = useAsyncAction(fetchSiteTide);
  let latest = 0;

  async function reload(): Promise<void> {
    if (!site.value || !span.value || !units.value) return;
    const ticket = ++latest;
    const next = await run(site.value.id, span.value, units.value);
    // Stepping through weeks quickly must not let an older answer replace a newer one.
    if (ticket === latest && next) tide.value = next;
  }

  watch([() => site.value?.id, () => span.value?.from, units], () => void reload(), { immediate: true });

  return { tide, span, loading, error, reload };
}
