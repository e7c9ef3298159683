import { computed, ref, type ComputedRef, type Ref } from 'vue';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { fetchMyHours, fetchMyWorkdays, type MyHours, type MyWorkday } from '@/api/me';
import { listWorkdays } from '@/api/workdays';
import { hoursSpan } from '@/utils/hours-period';
import { hasPlacesLeft } from '@/utils/workday-places';
import type { DateKey } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

/** How many open workdays the home page suggests. */
const OPEN_SHOWN = 3;

export interface VolunteerHome {
  mine: Ref<MyWorkday[] | null>;
  /** The next published workday I have a place on. */
  next: ComputedRef<MyWorkday | null>;
  /** Upcoming workdays where I'm in line. */
  waiting: ComputedRef<MyWorkday[]>;
  mineError: Ref<string | null>;
  year: Ref<MyHours | null>;
  yearError: Ref<string | null>;
  open: ComputedRef<WorkdayDto[]>;
  openLoaded: Ref<boolean>;
  openError: Ref<string | null>;
  load: () => Promise<void>;
}

/** The volunteer home: my next workday, this year's hours, and open workdays that still need people. */
export function useVolunteerHome(today: Ref<DateKey>, now: number = Date.now()): VolunteerHome {
  const mine = ref<MyWorkday[] | null>(null);
  const year = ref<MyHours | null>(null);
  const published = ref<WorkdayDto[]>([]);
  const openLoaded = ref(false);
  const { error: mineError, run: runMine } = useAsyncAction(fetchMyWorkdays);
  const { error: yearError, run: runYear } = useAsyncAction(fetchMyHours);
  const { error: openError, run: runOpen } = useAsyncAction(listWorkdays);

  const upcoming = computed(() => (mine.value ?? []).filter((m) => m.workday.status === 'published' && Date.parse(m.workday.endsAt) > now));
  const next = computed(() => upcoming.value.find((m) => m.signup.status === 'confirmed') ?? null);
  const waiting = computed(() => upcoming.value.filter((m) => m.signup.status === 'waitlisted'));
  const open = computed(() => {
    const taken = new Set((mine.value ?? []).map((m) => m.workday.id));
    return published.value.filter((w) => !taken.has(w.id) && Date.parse(w.startsAt) > now && hasPlacesLeft(w)).slice(0, OPEN_SHOWN);
  });

  async function load(): Promise<void> {
    const [m, y, o] = await Promise.all([runMine(), runYear(hoursSpan('this-year', today.value)), runOpen({ status: 'published', from: new Date(now).toISOString() })]);
    if (m) mine.value = m;
    if (y) year.value = y;
    if (o) published.value = o;
    openLoaded.value = o !== undefined;
  }

  return { mine, next, waiting, mineError, year, yearError, open, openLoaded, openError, load };
}
