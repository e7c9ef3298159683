import { ref, watch, type Ref } from 'vue';
import type { WorkdayDto, WorkdayStatus } from '@shared/schemas/workday.schema';
import { listWorkdays } from '@/api/workdays';
import { useOrganisationStore } from '@/stores/organisation';
import { localDateKey, zonedTime } from '@/utils/zoned-time';
import { useAsyncAction } from './useAsyncAction';

export interface WorkdayManageList {
  workdays: Ref<WorkdayDto[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  status: Ref<WorkdayStatus | ''>;
  /** From the start of today (the organisation's zone) on; off shows past workdays too. */
  upcoming: Ref<boolean>;
  reload: () => Promise<void>;
}

/** Every workday a coordinator runs, drafts included, filtered by status; reloaded when a filter changes. */
export function useWorkdayManageList(now: () => Date = () => new Date()): WorkdayManageList {
  const organisation = useOrganisationStore();
  const workdays = ref<WorkdayDto[]>([]);
  const status = ref<WorkdayStatus | ''>('');
  const upcoming = ref(true);
  const { loading, error, run } = useAsyncAction(listWorkdays);
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const from = upcoming.value ? zonedTime(localDateKey(now(), organisation.timeZone), organisation.timeZone).toISOString() : undefined;
    const rows = await run({ status: status.value || undefined, from });
    // Past workdays read newest first; upcoming ones soonest first.
    if (ticket === latest && rows) workdays.value = upcoming.value ? rows : [...rows].reverse();
  }

  watch([status, upcoming], () => void reload(), { immediate: true });
  return { workdays, loading, error, status, upcoming, reload };
}
