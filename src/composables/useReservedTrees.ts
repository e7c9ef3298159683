import { computed, ref, type ComputedRef, type Ref } from 'vue';
import type { ReadinessDto, TreeRow } from '@shared/schemas/nursery.schema';
import { listReservableTrees, listReservedTrees, releaseTree, reserveTrees } from '@/api/nursery-reservations';
import { fetchSiteReadiness } from '@/api/trees';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

export interface ReserveCandidate {
  tree: TreeRow;
  /** How the tree stands against the workday's site; undefined until judged (or when it can't be). */
  judged: ReadinessDto | undefined;
}

const MESSAGES = {
  conflict: 'Some of those trees were reserved for another workday meanwhile; nothing was changed.',
  validation_failed: 'Only brining or ready trees can be reserved; nothing was changed.',
};

/**
 * Trees set aside for one planting workday, and the trees that could be: brining or ready, not
 * promised elsewhere, those ready for the workday's site first.
 */
export function useReservedTrees(workdayId: () => string, siteId: () => string): {
  reserved: Ref<TreeRow[]>;
  candidates: ComputedRef<ReserveCandidate[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  candidatesLoading: Ref<boolean>;
  candidatesError: Ref<string | null>;
  judging: Ref<boolean>;
  acting: Ref<boolean>;
  actionError: Ref<string | null>;
  /** The reserved list only. */
  load: () => Promise<void>;
  /** What the picker needs: the trees free to reserve, then (slower) how each stands against the site. */
  loadCandidates: () => Promise<void>;
  reserve: (treeIds: string[]) => Promise<boolean>;
  release: (treeId: string) => Promise<boolean>;
} {
  const reserved = ref<TreeRow[]>([]);
  const open = ref<TreeRow[]>([]);
  const readiness = ref<Map<string, ReadinessDto>>(new Map());
  const list = useAsyncAction(() => listReservedTrees(workdayId()));
  const free = useAsyncAction(listReservableTrees);
  const judge = useAsyncAction(fetchSiteReadiness);
  const acting = ref(false);
  const actionError = ref<string | null>(null);

  const candidates = computed(() =>
    open.value
      .filter((t) => t.reservedWorkdayId === null)
      .map((tree) => ({ tree, judged: readiness.value.get(tree.id) }))
      .sort((a, b) => Number(b.judged?.ready ?? false) - Number(a.judged?.ready ?? false) || a.tree.tag.localeCompare(b.tree.tag)),
  );

  async function load(): Promise<void> {
    const out = await list.run();
    if (out) reserved.value = out;
  }

  async function loadCandidates(): Promise<void> {
    const out = await free.run();
    if (!out) return;
    open.value = out;
    // Judging every tree against the site's tides takes a few seconds: the list shows first.
    const judged = await judge.run(siteId());
    if (judged) readiness.value = new Map(judged.trees.map((t) => [t.treeId, t]));
  }

  async function act(fn: () => Promise<unknown>): Promise<boolean> {
    acting.value = true;
    actionError.value = null;
    try {
      await fn();
      const [mine, others] = await Promise.all([listReservedTrees(workdayId()), listReservableTrees()]);
      reserved.value = mine;
      open.value = others;
      return true;
    } catch (err) {
      actionError.value = errorMessage(err, MESSAGES);
      return false;
    } finally {
      acting.value = false;
    }
  }

  return {
    reserved, candidates, loading: list.loading, error: list.error, candidatesLoading: free.loading, candidatesError: free.error, judging: judge.loading, acting, actionError, load, loadCandidates,
    reserve: (treeIds) => act(() => reserveTrees(workdayId(), treeIds)),
    release: (treeId) => act(() => releaseTree(workdayId(), treeId)),
  };
}
