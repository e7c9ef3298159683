import { computed, ref, type ComputedRef, type Ref } from 'vue';
import type { MeasurementRoundBody, TreeRow } from '@shared/schemas/nursery.schema';
import { recordMeasurementRound } from '@/api/tanks';
import { listTreesInTank } from '@/api/trees';
import { ApiError } from '@/api/http';
import { errorMessage } from '@/utils/error-message';
import { roundEntry, type RoundRow } from '@/utils/nursery-round';
import { useAsyncAction } from './useAsyncAction';

export interface MeasurementRound {
  rows: Ref<RoundRow[]>;
  loading: Ref<boolean>;
  loadError: Ref<string | null>;
  /** Rows with something typed in them: what "Save" would send. */
  filled: ComputedRef<number>;
  saving: Ref<boolean>;
  /** A summary, then one line per tree the server refused (nothing is stored then). */
  saveError: Ref<string[] | null>;
  saved: Ref<number | null>;
  load: () => Promise<void>;
  save: () => Promise<boolean>;
}

/** A measurement round for every tree standing in one tank: one row per tree, sent in one call. */
export function useMeasurementRound(tankId: () => string): MeasurementRound {
  const rows = ref<RoundRow[]>([]);
  const list = useAsyncAction(listTreesInTank);
  const saving = ref(false);
  const saveError = ref<string[] | null>(null);
  const saved = ref<number | null>(null);

  const fresh = (t: TreeRow): RoundRow => ({ tree: t, height: '', leaves: '', healthy: t.healthy, note: '' });

  async function load(): Promise<void> {
    const trees = await list.run(tankId());
    if (trees) rows.value = trees.map(fresh);
  }

  const entries = computed(() => rows.value.map(roundEntry));
  const filled = computed(() => entries.value.filter((e) => e !== null).length);

  async function save(): Promise<boolean> {
    saved.value = null;
    const bad = rows.value.flatMap((r, i) => (typeof entries.value[i] === 'string' ? [`${r.tree.tag}: ${entries.value[i]}`] : []));
    const measurements = entries.value.filter((e): e is MeasurementRoundBody['measurements'][number] => e !== null && typeof e !== 'string');
    if (bad.length > 0) saveError.value = ['Fix these rows; nothing was saved.', ...bad];
    else if (measurements.length === 0) saveError.value = ['Type a height, leaf count or note for at least one tree.'];
    if (bad.length > 0 || measurements.length === 0) return false;
    saveError.value = null;
    saving.value = true;
    try {
      const out = await recordMeasurementRound(tankId(), { measurements });
      saved.value = out.recorded;
      const latest = new Map(out.trees.map((t) => [t.id, t]));
      rows.value = rows.value.map((r) => fresh(latest.get(r.tree.id) ?? r.tree));
      return true;
    } catch (err) {
      const perTree = err instanceof ApiError ? Object.values(err.fields ?? {}).flat() : [];
      saveError.value = [errorMessage(err, { validation_failed: 'The round was not saved; nothing was stored.' }), ...perTree];
      return false;
    } finally {
      saving.value = false;
    }
  }

  return { rows, loading: list.loading, loadError: list.error, filled, saving, saveError, saved, load, save };
}
