import { computed, reactive, ref, watch, type Ref } from 'vue';
import { fetchMyHours, type MyHours } from '@/api/me';
import { hoursSpan, type HoursPeriod } from '@/utils/hours-period';
import { isDateKey, type DateKey } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

export interface MyHoursState {
  period: Ref<HoursPeriod>;
  custom: { from: string; to: string };
  hours: Ref<MyHours | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  /** This calendar year's totals, whatever period is chosen (the page opens on this year). */
  year: Ref<MyHours | null>;
}

/** My volunteer hours: the year's totals, and the rows of a chosen period (reloaded when it changes). */
export function useMyHours(today: Ref<DateKey>): MyHoursState {
  const period = ref<HoursPeriod>('this-year');
  const custom = reactive({ from: '', to: '' });
  const hours = ref<MyHours | null>(null);
  const year = ref<MyHours | null>(null);
  const { loading, error, run } = useAsyncAction(fetchMyHours);
  const span = computed(() => {
    const dates = { from: isDateKey(custom.from) ? custom.from : '', to: isDateKey(custom.to) ? custom.to : '' };
    return hoursSpan(period.value, today.value, dates);
  });
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const wanted = period.value;
    const next = await run(span.value);
    if (ticket !== latest || !next) return;
    hours.value = next;
    if (wanted === 'this-year') year.value = next;
  }

  watch(() => `${span.value.from ?? ''}|${span.value.to ?? ''}`, () => void reload(), { immediate: true });

  return { period, custom, hours, loading, error, reload, year };
}
