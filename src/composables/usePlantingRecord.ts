import { computed, ref, type ComputedRef, type Ref } from 'vue';
import type { TreeRow } from '@shared/schemas/nursery.schema';
import { ApiError } from '@/api/http';
import { fetchPlantings, recordPlantings, undoPlanting, type PlantingList, type PlantingTree } from '@/api/plantings';
import { useOrganisationStore } from '@/stores/organisation';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';
import { plantingRow, rowElevationM, type PlantingRow } from './usePlantingRows';

export interface PlantingRecord {
  list: Ref<PlantingList | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  load: () => Promise<void>;
  /** Trees offered for this record: the reserved ones (pre-ticked) and any added by tag. */
  rows: Ref<PlantingRow[]>;
  planted: ComputedRef<PlantingTree[]>;
  plantedOn: Ref<string>;
  allowUnready: Ref<boolean>;
  ticked: ComputedRef<PlantingRow[]>;
  /** Adds a nursery tree found by tag, ticked; false when it is already on the list. */
  add: (tree: TreeRow) => boolean;
  saving: Ref<boolean>;
  /** Per-row messages (by tree id), a message above the form, and the server's list of refused trees. */
  rowErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  problems: Ref<string[]>;
  /** Resolves to the number recorded, or null when nothing was saved. */
  save: () => Promise<number | null>;
  undoing: Ref<string | null>;
  /** Resolves to null when undone, or to the message to show. */
  undo: (tree: PlantingTree) => Promise<string | null>;
}

const SAVE_MESSAGES = {
  conflict: 'Some trees cannot be recorded as planted; nothing was changed.',
  validation_failed: 'Some answers need another look; nothing was changed.',
  not_found: 'A tree on the list was not found; reload the page.',
};

/** The planting record of one planting workday: which trees went in, where, when and at what bed elevation. */
export function usePlantingRecord(workdayId: () => string): PlantingRecord {
  const organisation = useOrganisationStore();
  const list = ref<PlantingList | null>(null);
  const rows = ref<PlantingRow[]>([]);
  const plantedOn = ref('');
  const allowUnready = ref(false);
  const saving = ref(false);
  const undoing = ref<string | null>(null);
  const rowErrors = ref<Record<string, string>>({});
  const formError = ref<string | null>(null);
  const problems = ref<string[]>([]);
  const { loading, error, run } = useAsyncAction(fetchPlantings, { not_found: "This workday wasn't found. It may have been removed." });

  const planted = computed(() => (list.value?.trees ?? []).filter((t) => t.planted));
  const ticked = computed(() => rows.value.filter((r) => r.ticked));

  /** Takes the server's list; after a save or undo (`keep`) the rows still on it keep what was ticked and typed. */
  function take(next: PlantingList, keep = false): void {
    const before = new Map(keep ? rows.value.map((r) => [r.id, r]) : []);
    list.value = next;
    if (!keep || !plantedOn.value) plantedOn.value = next.workday.localDate;
    rows.value = next.trees.filter((t) => !t.planted).map((t) => before.get(t.id) ?? plantingRow(t, t.suggestedBedElevationM, organisation.units));
  }

  async function load(): Promise<void> {
    if (!organisation.loaded) await organisation.load();
    const next = await run(workdayId());
    if (next) take(next);
  }

  function add(tree: TreeRow): boolean {
    if (!list.value || rows.value.some((r) => r.id === tree.id) || planted.value.some((t) => t.id === tree.id)) return false;
    const row = plantingRow({ ...tree, reserved: false }, list.value.site.bedElevationM, organisation.units);
    rows.value = [...rows.value, { ...row, ticked: true }];
    return true;
  }

  function clearMessages(): void {
    rowErrors.value = {};
    formError.value = null;
    problems.value = [];
  }

  function body() {
    const errors: Record<string, string> = {};
    const trees = ticked.value.map((r) => {
      const e = rowElevationM(r, organisation.units);
      if ('error' in e) errors[r.id] = e.error;
      return { treeId: r.id, bedElevationM: 'metres' in e ? e.metres : 0 };
    });
    return { errors, trees };
  }

  /** The server names every refused tree (all or none is saved); an elevation goes under its row, the date above the form. */
  function showFields(fields: Record<string, string[]>, sent: string[]): void {
    const perRow: Record<string, string> = {};
    const listed: string[] = [];
    for (const [key, msgs] of Object.entries(fields)) {
      const row = /^trees\.(\d+)\.bedElevationM$/.exec(key);
      const treeId = row ? sent[Number(row[1])] : undefined;
      if (treeId && msgs[0]) perRow[treeId] = `Bed elevation ${msgs[0]}`;
      else listed.push(...(key === 'trees' ? msgs : msgs.map((m) => `${key === 'plantedOn' ? 'Planting date' : key}: ${m}`)));
    }
    rowErrors.value = perRow;
    problems.value = listed;
  }

  async function save(): Promise<number | null> {
    clearMessages();
    const { errors, trees } = body();
    if (Object.keys(errors).length > 0) rowErrors.value = errors;
    else if (trees.length === 0) formError.value = 'Tick at least one tree to record.';
    if (Object.keys(errors).length > 0 || trees.length === 0) return null;
    saving.value = true;
    try {
      const result = await recordPlantings(workdayId(), { plantedOn: plantedOn.value, allowUnready: allowUnready.value, trees });
      take(result, true);
      return result.recorded;
    } catch (err) {
      formError.value = errorMessage(err, SAVE_MESSAGES);
      if (err instanceof ApiError && err.fields) showFields(err.fields, trees.map((t) => t.treeId));
      return null;
    } finally {
      saving.value = false;
    }
  }

  async function undo(tree: PlantingTree): Promise<string | null> {
    undoing.value = tree.id;
    try {
      await undoPlanting(workdayId(), tree.id);
      const next = await fetchPlantings(workdayId());
      const kept = rows.value.filter((r) => !r.reserved);
      take(next, true);
      rows.value = [...rows.value, ...kept.filter((k) => !rows.value.some((r) => r.id === k.id))];
      return null;
    } catch (err) {
      return errorMessage(err, { conflict: `${tree.tag} already has monitoring checks: correct those instead of undoing the planting.` });
    } finally {
      undoing.value = null;
    }
  }

  return { list, loading, error, load, rows, planted, plantedOn, allowUnready, ticked, add, saving, rowErrors, formError, problems, save, undoing, undo };
}
