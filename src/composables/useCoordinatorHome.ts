import { computed, ref, type ComputedRef, type Ref } from 'vue';
import type { RosterRow } from '@shared/schemas/roster.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { fetchRoster } from '@/api/roster';
import { listWorkdays } from '@/api/workdays';
import { useOrganisationStore } from '@/stores/organisation';
import { localDateKey, zonedTime } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

const UPCOMING_SHOWN = 5;
const SIGNUPS_SHOWN = 5;

export interface CoordinatorHome {
  loading: Ref<boolean>;
  error: Ref<string | null>;
  loaded: Ref<boolean>;
  reload: () => Promise<void>;
  /** The first published workday that hasn't ended. */
  next: ComputedRef<WorkdayDto | null>;
  upcoming: ComputedRef<WorkdayDto[]>;
  drafts: ComputedRef<WorkdayDto[]>;
  /** The next workday's most recent sign-ups, newest first; empty when its roster couldn't be read. */
  latestSignups: Ref<RosterRow[]>;
}

/** "At the water": workdays from today on, drafts included, and who joined the next one lately. */
export function useCoordinatorHome(now: () => Date = () => new Date()): CoordinatorHome {
  const organisation = useOrganisationStore();
  const workdays = ref<WorkdayDto[]>([]);
  const latestSignups = ref<RosterRow[]>([]);
  const loaded = ref(false);

  const live = computed(() => workdays.value.filter((w) => w.status === 'published' && Date.parse(w.endsAt) > now().getTime()));
  const next = computed(() => live.value[0] ?? null);
  const upcoming = computed(() => live.value.slice(1, 1 + UPCOMING_SHOWN));
  const drafts = computed(() => workdays.value.filter((w) => w.status === 'draft'));

  const { loading, error, run } = useAsyncAction(async () => {
    if (!organisation.loaded) await organisation.load();
    const tz = organisation.timeZone;
    return listWorkdays({ from: zonedTime(localDateKey(now(), tz), tz).toISOString() });
  });

  async function loadSignups(workday: WorkdayDto | null): Promise<void> {
    // Only a nice-to-have on the home page: a failure leaves the list out rather than the page.
    const rows = workday ? await fetchRoster(workday.id).catch(() => []) : [];
    latestSignups.value = [...rows].sort((a, b) => b.waiverSignedAt.localeCompare(a.waiverSignedAt)).slice(0, SIGNUPS_SHOWN);
  }

  async function reload(): Promise<void> {
    const rows = await run();
    if (!rows) return;
    workdays.value = rows;
    loaded.value = true;
    await loadSignups(next.value);
  }

  return { loading, error, loaded, reload, next, upcoming, drafts, latestSignups };
}
