import { ref, type Ref } from 'vue';
import type { Craft } from '@shared/schemas/trips.schema';
import { listFleet, retireCraft } from '@/api/fleet';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

export interface FleetState {
  craft: Ref<Craft[] | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  /** The craft being retired now, for its button's spinner. */
  retiring: Ref<string | null>;
  /** Resolves to null on success, or to the message to show. */
  retire: (id: string) => Promise<string | null>;
  /** Puts a saved craft in the list (new ones too), keeping the server's order: in service first, then by name. */
  put: (saved: Craft) => void;
}

function ordered(list: Craft[]): Craft[] {
  return [...list].sort((a, b) => Number(b.active) - Number(a.active) || a.name.localeCompare(b.name));
}

/** The organisation's fleet for the coordinator: load, retire, and keep the list in step with the form. */
export function useFleet(): FleetState {
  const craft = ref<Craft[] | null>(null);
  const retiring = ref<string | null>(null);
  const { loading, error, run } = useAsyncAction(listFleet);

  async function reload(): Promise<void> {
    const next = await run();
    if (next) craft.value = next;
  }
  void reload();

  function put(saved: Craft): void {
    const rest = (craft.value ?? []).filter((c) => c.id !== saved.id);
    craft.value = ordered([...rest, saved]);
  }

  async function retire(id: string): Promise<string | null> {
    retiring.value = id;
    try {
      put(await retireCraft(id));
      return null;
    } catch (err) {
      return errorMessage(err, { not_found: 'This craft was not found. It may have been removed; reload the page.' });
    } finally {
      retiring.value = null;
    }
  }

  return { craft, loading, error, reload, retiring, retire, put };
}
