import { computed, ref, watch, type ComputedRef, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import { fetchAllWindows, type AllWindows } from '@/api/tide';
import { buildCalendarDays, calendarQuerySpan, type CalendarDay, type MonthKey } from '@/utils/window-calendar';
import type { DateKey } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

export interface WindowCalendar {
  data: Ref<AllWindows | null>;
  days: ComputedRef<CalendarDay[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/** A month of low-water windows across every site, reloaded when the month or units change (units null: wait). */
export function useWindowCalendar(month: Ref<MonthKey>, units: Ref<LengthUnit | null>, today: Ref<DateKey>): WindowCalendar {
  const data = ref<AllWindows | null>(null);
  const shownMonth = ref<MonthKey>(month.value);
  const days = computed(() => (data.value ? buildCalendarDays(data.value, shownMonth.value, today.value) : []));
  const { loading, error, run } = useAsyncAction(fetchAllWindows);
  let latest = 0;

  async function reload(): Promise<void> {
    if (!units.value) return;
    const ticket = ++latest;
    const wanted = month.value;
    const next = await run(calendarQuerySpan(wanted), units.value);
    if (ticket !== latest || !next) return;
    data.value = next;
    shownMonth.value = wanted;
  }

  watch([month, units], () => void reload(), { immediate: true });

  return { data, days, loading, error, reload };
}
