import { reactive, ref, type Ref } from 'vue';
import type { BulkMoveBody, TreeRow, TreeStage } from '@shared/schemas/nursery.schema';
import { ApiError } from '@/api/http';
import { listTrees, moveTrees, type TreeQuery } from '@/api/trees';
import { errorMessage } from '@/utils/error-message';
import { useAsyncAction } from './useAsyncAction';

export interface TreeLedger {
  query: TreeQuery;
  trees: Ref<TreeRow[]>;
  total: Ref<number>;
  selected: Ref<string[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  moving: Ref<boolean>;
  moveError: Ref<string | null>;
  reload: () => Promise<void>;
  /** Back to page 1 after a filter changes. */
  search: () => Promise<void>;
  move: (to: { stage?: TreeStage; tankId?: string | null }) => Promise<boolean>;
}

/** The ledger's filters, current page and selection, with the bulk move for coordinators. */
export function useTreeLedger(pageSize = 25): TreeLedger {
  const query = reactive<TreeQuery>({ stage: '', tankId: '', q: '', page: 1, pageSize });
  const trees = ref<TreeRow[]>([]);
  const total = ref(0);
  const selected = ref<string[]>([]);
  const list = useAsyncAction(listTrees);
  const moving = ref(false);
  const moveError = ref<string | null>(null);

  async function reload(): Promise<void> {
    const page = await list.run({ ...query });
    if (!page) return;
    trees.value = page.trees;
    total.value = page.total;
    const shown = new Set(page.trees.map((t) => t.id));
    selected.value = selected.value.filter((id) => shown.has(id));
  }

  async function search(): Promise<void> {
    query.page = 1;
    await reload();
  }

  async function move(to: { stage?: TreeStage; tankId?: string | null }): Promise<boolean> {
    const body: BulkMoveBody = { treeIds: [...selected.value], ...to };
    moving.value = true;
    moveError.value = null;
    try {
      await moveTrees(body);
    } catch (err) {
      moveError.value = refusal(err);
      return false;
    } finally {
      moving.value = false;
    }
    selected.value = [];
    await reload();
    return true;
  }

  return {
    query, trees, total, selected, loading: list.loading, error: list.error,
    moving, moveError, reload, search, move,
  };
}

/** The server names each tree that cannot move and why (e.g. stages only move forward): show those reasons, not only that nothing moved. */
function refusal(err: unknown): string {
  const reasons = err instanceof ApiError && err.code === 'validation_failed' ? (err.fields?.treeIds ?? []) : [];
  if (reasons.length > 0) return `Nothing was moved. ${reasons.join('. ')}.`;
  return errorMessage(err, { validation_failed: 'Those trees could not be moved; nothing was changed.' });
}
