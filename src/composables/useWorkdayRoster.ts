import { ref, watch, type Ref } from 'vue';
import type { RosterRow } from '@shared/schemas/roster.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { fetchRoster } from '@/api/roster';
import { fetchWorkday } from '@/api/workdays';
import { useAsyncAction } from './useAsyncAction';

export interface WorkdayRoster {
  workday: Ref<WorkdayDto | null>;
  roster: Ref<RosterRow[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
}

/** A workday and its roster, loaded together; reload after every check-in step to show the server's truth. */
export function useWorkdayRoster(id: Ref<string>): WorkdayRoster {
  const workday = ref<WorkdayDto | null>(null);
  const roster = ref<RosterRow[]>([]);
  const { loading, error, run } = useAsyncAction((workdayId: string) => Promise.all([fetchWorkday(workdayId), fetchRoster(workdayId)]), {
    not_found: "This workday wasn't found. It may have been removed.",
  });
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    const answer = await run(id.value);
    if (ticket !== latest || !answer) return;
    [workday.value, roster.value] = answer;
  }

  watch(id, () => {
    workday.value = null;
    roster.value = [];
    void reload();
  }, { immediate: true });

  return { workday, roster, loading, error, reload };
}
