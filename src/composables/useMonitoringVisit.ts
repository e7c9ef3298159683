import { computed, reactive, ref, type ComputedRef, type Ref } from 'vue';
import type { PhotoDto } from '@shared/schemas/nursery.schema';
import { fetchVisit, lookupVisitTree, saveCheck, type CheckResult, type TreeCondition, type VisitDetail, type VisitTree } from '@/api/monitoring';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

export interface CheckForm {
  condition: TreeCondition | null;
  /** Centimetres as typed; empty when not measured. */
  height: string;
  notes: string;
  photo: PhotoDto | null;
}

export interface MonitoringVisitState {
  detail: Ref<VisitDetail | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  load: () => Promise<void>;
  /** "12 of 40 trees checked". */
  progress: ComputedRef<string>;
  checked: ComputedRef<VisitTree[]>;
  unchecked: ComputedRef<VisitTree[]>;
  current: Ref<VisitTree | null>;
  form: CheckForm;
  select: (tree: VisitTree) => void;
  /** Finds a tree by its tag as typed; resolves to null when found, or to the message to show. */
  find: (tag: string) => Promise<string | null>;
  saving: Ref<boolean>;
  saveError: Ref<string | null>;
  fieldErrors: Ref<Record<string, string>>;
  /** Saves the current tree's check, then moves to the next unchecked tree; resolves to the tag saved, or null. */
  saveAndNext: () => Promise<string | null>;
}

const emptyForm = (): CheckForm => ({ condition: null, height: '', notes: '', photo: null });

/** One monitoring visit, tree by tree: find a tree by tag, record alive / lost / missing, move on to the next. */
export function useMonitoringVisit(visitId: () => string): MonitoringVisitState {
  const detail = ref<VisitDetail | null>(null);
  const current = ref<VisitTree | null>(null);
  const form = reactive<CheckForm>(emptyForm());
  const saving = ref(false);
  const saveError = ref<string | null>(null);
  const fieldErrors = ref<Record<string, string>>({});
  const { loading, error, run } = useAsyncAction(fetchVisit, { not_found: "This visit wasn't found. It may have been removed." });

  const trees = computed(() => detail.value?.trees ?? []);
  const checked = computed(() => trees.value.filter((t) => t.check !== null));
  const unchecked = computed(() => trees.value.filter((t) => t.check === null));
  const progress = computed(() => `${checked.value.length} of ${trees.value.length} ${trees.value.length === 1 ? 'tree' : 'trees'} checked`);

  function select(tree: VisitTree): void {
    current.value = tree;
    saveError.value = null;
    fieldErrors.value = {};
    const c = tree.check;
    Object.assign(form, c
      ? { condition: c.condition, height: c.heightCm === null ? '' : String(c.heightCm), notes: c.notes, photo: c.photoId ? { id: c.photoId, url: c.photoUrl ?? '', thumbUrl: c.thumbUrl ?? '' } : null }
      : emptyForm());
  }

  /** The next tree without a check, after `tag` in tag order (wrapping round), or null when all are checked. */
  function nextAfter(tag: string): VisitTree | null {
    const open = unchecked.value;
    return open.find((t) => t.tag > tag) ?? open[0] ?? null;
  }

  async function load(): Promise<void> {
    const next = await run(visitId());
    if (!next) return;
    detail.value = next;
    const first = next.trees.find((t) => t.check === null);
    if (!current.value && first) select(first);
  }

  async function find(tag: string): Promise<string | null> {
    const typed = tag.trim();
    if (!typed) return 'Type a tag number.';
    const here = trees.value.find((t) => t.tag.toLowerCase() === typed.toLowerCase());
    if (here) return (select(here), null);
    try {
      select(await lookupVisitTree(visitId(), typed));
      return null;
    } catch (err) {
      const site = detail.value?.visit.siteName ?? 'this site';
      return errorMessage(err, { not_found: `No tree tagged “${typed}” was planted at ${site} by the visit date.`, validation_failed: 'Type a tag number.' });
    }
  }

  function heightCm(): number | null | 'bad' {
    const text = form.height.trim();
    if (!text) return null;
    const n = Number(text);
    return Number.isFinite(n) && n >= 0 && n <= 2000 ? n : 'bad';
  }

  function merge({ tree, counts }: CheckResult): void {
    if (!detail.value) return;
    const others = detail.value.trees.filter((t) => t.id !== tree.id);
    detail.value = { visit: { ...detail.value.visit, counts }, trees: [...others, tree].sort((a, b) => a.tag.localeCompare(b.tag)) };
  }

  async function saveAndNext(): Promise<string | null> {
    const tree = current.value;
    saveError.value = null;
    fieldErrors.value = {};
    if (!tree) return null;
    const height = heightCm();
    if (!form.condition) fieldErrors.value = { condition: 'Choose alive, lost or missing.' };
    if (height === 'bad') fieldErrors.value = { ...fieldErrors.value, heightCm: 'Height is a number of centimetres from 0 to 2000.' };
    if (!form.condition || height === 'bad') return null;
    saving.value = true;
    try {
      const result = await saveCheck(visitId(), tree.id, { condition: form.condition, heightCm: height, notes: form.notes.trim(), photoId: form.photo?.id ?? null });
      merge(result);
      const next = nextAfter(tree.tag);
      if (next) select(next);
      else {
        current.value = null;
        Object.assign(form, emptyForm());
      }
      return tree.tag;
    } catch (err) {
      saveError.value = errorMessage(err, { conflict: `${tree.tag} cannot be checked at this visit: it was not planted at this site by the visit date.` });
      return null;
    } finally {
      saving.value = false;
    }
  }

  return { detail, loading, error, load, progress, checked, unchecked, current, form, select, find, saving, saveError, fieldErrors, saveAndNext };
}
