import { ref, watch, type Ref } from 'vue';
import { fetchCrew, type CrewMate } from '@/api/signups';
import { useAsyncAction } from './useAsyncAction';

/** Signed in: the confirmed crew's first names and roles. Nothing loads while signed out. */
export function useWorkdayCrew(workdayId: Ref<string>, signedIn: Ref<boolean>): {
  crew: Ref<CrewMate[] | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
} {
  const crew = ref<CrewMate[] | null>(null);
  const { loading, error, run } = useAsyncAction(fetchCrew);

  async function reload(): Promise<void> {
    if (!signedIn.value) return;
    const next = await run(workdayId.value);
    if (next) crew.value = next;
  }

  watch([workdayId, signedIn], () => {
    crew.value = null;
    void reload();
  }, { immediate: true });

  return { crew, loading, error, reload };
}
