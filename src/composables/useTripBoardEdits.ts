import { ref, type Ref } from 'vue';
import { ApiError } from '@/api/http';
import { saveTripPlan, type StoredTripPlan, type TripRunDto } from '@/api/trip-plans';
import { errorMessage } from '@/utils/error-message';
import { placeRefusal, type PlacedViolation, type TripNames } from '@/utils/trip-board';
import { applyEdit, describeEdit, toRunInputs, type TripEdit } from '@/utils/trip-edits';

export interface TripRejection {
  /** The refused edit in words. */
  edit: string;
  violations: PlacedViolation[];
}

/** The server's reasons, each beside the run it concerns (see `placeRefusal`); else the error's message. */
function reasons(err: unknown, sent: readonly TripRunDto[]): PlacedViolation[] {
  if (err instanceof ApiError && err.code === 'validation_failed' && err.fields) {
    const placed = placeRefusal(err.fields, sent);
    if (placed.length > 0) return placed;
  }
  return [{ text: errorMessage(err, { not_found: 'The plan is gone. Build it again.', conflict: 'Someone changed the plan meanwhile. Reload the page.' }) }];
}

/**
 * Hand edits of a stored plan. Each edit is sent at once with PUT: the server checks it against
 * every rule of the planner (they live on the server) and stores it only when all hold. A refused
 * edit leaves the board as it was, and its reasons are placed beside the runs they name.
 */
export function useTripBoardEdits(id: Ref<string>, stored: Ref<StoredTripPlan | null>, names: Ref<TripNames>) {
  const saving = ref(false);
  const rejection = ref<TripRejection | null>(null);
  /** The last accepted edit in words, for the status line read out to screen readers. */
  const lastSaved = ref<string | null>(null);

  async function edit(change: TripEdit): Promise<boolean> {
    const current = stored.value;
    if (!current || saving.value) return false;
    const runs = applyEdit(current.plan.runs, change);
    if (!runs) return false;
    saving.value = true;
    rejection.value = null;
    lastSaved.value = null;
    try {
      stored.value = await saveTripPlan(id.value, toRunInputs(runs));
      lastSaved.value = describeEdit(change, names.value);
      return true;
    } catch (err) {
      rejection.value = { edit: describeEdit(change, names.value), violations: reasons(err, runs) };
      return false;
    } finally {
      saving.value = false;
    }
  }

  return { saving, rejection, lastSaved, edit };
}
