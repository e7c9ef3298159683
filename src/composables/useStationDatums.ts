import { ref, type Ref } from 'vue';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import { fetchStationDatums, type StationDatums } from '@/api/stations';
import { useAsyncAction } from './useAsyncAction';

const SPAN_DAYS = 365;

/**
 * A station's tidal datums computed from a year of predictions (ending today), beside its published
 * ones. Loaded on demand: the table sits in a collapsed section of the tide board.
 */
export function useStationDatums(
  now: () => Date = () => new Date(),
): { datums: Ref<StationDatums | null>; loading: Ref<boolean>; error: Ref<string | null>; load: (stationId: string, units: LengthUnit) => Promise<void> } {
  const datums = ref<StationDatums | null>(null);
  const { loading, error, run } = useAsyncAction(fetchStationDatums);

  async function load(stationId: string, units: LengthUnit): Promise<void> {
    const to = now();
    const from = new Date(to.getTime() - SPAN_DAYS * 86_400_000);
    const span = { from: from.toISOString().slice(0, 10), to: to.toISOString().slice(0, 10) };
    const next = await run(stationId, span, units);
    if (next) datums.value = next;
  }

  return { datums, loading, error, load };
}
