import { ref, watch, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { LowWaterWindowDto } from '@shared/schemas/tide.schema';
import { fetchSiteWindows } from '@/api/tide';
import { useAsyncAction } from './useAsyncAction';

const WEEKS_AHEAD = 8;
const SHOWN = 10;

/** The best low-water windows of the next eight weeks at one site, best first. */
export function useRankedWindows(
  siteId: Ref<string>,
  units: Ref<LengthUnit | null>,
  now: () => Date = () => new Date(),
): { windows: Ref<LowWaterWindowDto[]>; loading: Ref<boolean>; error: Ref<string | null>; reload: () => Promise<void> } {
  const windows = ref<LowWaterWindowDto[]>([]);
  const { loading, error, run } = useAsyncAction(fetchSiteWindows);

  async function reload(): Promise<void> {
    if (!units.value) return;
    const from = now();
    const to = new Date(from.getTime() + WEEKS_AHEAD * 7 * 86_400_000);
    const answer = await run(siteId.value, { from: from.toISOString(), to: to.toISOString() }, units.value, 'score');
    if (answer) windows.value = [...answer.windows].sort((a, b) => b.score - a.score).slice(0, SHOWN);
  }

  watch([siteId, units], () => void reload(), { immediate: true });

  return { windows, loading, error, reload };
}
