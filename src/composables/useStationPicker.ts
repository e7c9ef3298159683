import { onBeforeUnmount, ref, watch, type Ref } from 'vue';
import type { StationSummary } from '@shared/schemas/tide.schema';
import { nearestStations, searchStations } from '@/api/stations';
import { useAsyncAction } from './useAsyncAction';

const SEARCH_DELAY_MS = 300;

export interface StationPicker {
  query: Ref<string>;
  results: Ref<StationSummary[]>;
  /** What the list shows: matches for the search box, or the stations nearest the coordinates. */
  mode: Ref<'search' | 'near' | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  findNearest: (latitude: number, longitude: number) => Promise<void>;
}

/** Search stations by name or id as the person types, or list the nearest to a point. */
export function useStationPicker(): StationPicker {
  const query = ref('');
  const results = ref<StationSummary[]>([]);
  const mode = ref<'search' | 'near' | null>(null);
  let latest = 0;

  const { loading, error, run } = useAsyncAction(async (load: () => Promise<StationSummary[]>, nextMode: 'search' | 'near') => {
    const ticket = ++latest;
    const rows = await load();
    if (ticket !== latest) return;
    results.value = rows;
    mode.value = nextMode;
  });

  let timer: ReturnType<typeof setTimeout> | undefined;
  watch(query, (text) => {
    clearTimeout(timer);
    const q = text.trim();
    if (q.length < 2) return;
    timer = setTimeout(() => void run(() => searchStations(q), 'search'), SEARCH_DELAY_MS);
  });
  onBeforeUnmount(() => clearTimeout(timer));

  async function findNearest(latitude: number, longitude: number): Promise<void> {
    clearTimeout(timer);
    await run(() => nearestStations(latitude, longitude), 'near');
  }

  return { query, results, mode, loading, error, findNearest };
}
