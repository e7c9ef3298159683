import { computed, ref, watch, type ComputedRef, type Ref } from 'vue';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { listWorkdays } from '@/api/workdays';
import { calendarQuerySpan, type MonthKey } from '@/utils/window-calendar';
import { siteChoices, type SiteChoice, type WorkdayCalendarMode } from '@/utils/workday-calendar';
import { zonedTime, type DateKey } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

export interface WorkdayCalendar {
  workdays: Ref<WorkdayDto[]>;
  /** The month the loaded workdays belong to (month view), so the grid never mixes two months. */
  shownMonth: Ref<MonthKey>;
  /** Every site seen so far, so the site filter keeps its choices while the month changes. */
  sites: ComputedRef<SiteChoice[]>;
  loaded: Ref<boolean>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/**
 * Published (and cancelled) workdays for the public calendar: a month with a day's margin either
 * side in month view, or everything from today on in list view. Reloads when either changes.
 */
export function useWorkdayCalendar(mode: Ref<WorkdayCalendarMode>, month: Ref<MonthKey>, today: Ref<DateKey>, timeZone: Ref<string>): WorkdayCalendar {
  const workdays = ref<WorkdayDto[]>([]);
  const shownMonth = ref<MonthKey>(month.value);
  const loaded = ref(false);
  const known = ref<SiteChoice[]>([]);
  const sites = computed(() => known.value);
  const { loading, error, run } = useAsyncAction(listWorkdays);
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const wanted = month.value;
    const span = mode.value === 'month' ? calendarQuerySpan(wanted) : { from: zonedTime(today.value, timeZone.value).toISOString() };
    const rows = await run(span);
    // Paging through months quickly must not let an older answer replace a newer one.
    if (ticket !== latest || !rows) return;
    workdays.value = rows;
    shownMonth.value = wanted;
    const fresh = siteChoices(rows);
    known.value = [...known.value.filter((s) => !fresh.some((f) => f.id === s.id)), ...fresh].sort((a, b) => a.name.localeCompare(b.name));
    loaded.value = true;
  }

  watch([mode, month], () => void reload(), { immediate: true });

  return { workdays, shownMonth, sites, loaded, loading, error, reload };
}
