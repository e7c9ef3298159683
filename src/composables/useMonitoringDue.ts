import { computed, ref, type ComputedRef, type Ref } from 'vue';
import { fetchMonitoringDue, type MonitoringDueDto } from '@/api/monitoring';
import { useAsyncAction } from './useAsyncAction';

/** Planting cohorts whose next monitoring check is due or overdue, for the monitoring page and the coordinator's home. */
export function useMonitoringDue(): { due: Ref<MonitoringDueDto | null>; cohorts: ComputedRef<number>; loading: Ref<boolean>; error: Ref<string | null>; load: () => Promise<void> } {
  const due = ref<MonitoringDueDto | null>(null);
  const { loading, error, run } = useAsyncAction(fetchMonitoringDue);
  const cohorts = computed(() => (due.value?.sites ?? []).reduce((n, s) => n + s.cohorts.length, 0));

  async function load(): Promise<void> {
    const next = await run();
    if (next) due.value = next;
  }

  return { due, cohorts, loading, error, load };
}
