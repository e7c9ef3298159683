import { ref, type Ref } from 'vue';
import type { ReadingDto } from '@shared/schemas/nursery.schema';
import { listReadings } from '@/api/tanks';
import { useAsyncAction } from './useAsyncAction';

/** One tank's salinity log, newest first. */
export function useTankReadings(tankId: () => string): {
  readings: Ref<ReadingDto[] | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
} {
  const readings = ref<ReadingDto[] | null>(null);
  const { loading, error, run } = useAsyncAction(listReadings);

  async function reload(): Promise<void> {
    const out = await run(tankId());
    if (out) readings.value = out;
  }

  return { readings, loading, error, reload };
}
