import { computed, ref, watch, type Ref } from 'vue';
import type { RosterRow } from '@shared/schemas/roster.schema';
import type { Craft } from '@shared/schemas/trips.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { listFleet } from '@/api/fleet';
import { fetchRoster } from '@/api/roster';
import { buildTripPlan, fetchTripPlan, type StoredTripPlan } from '@/api/trip-plans';
import { fetchWorkday } from '@/api/workdays';
import { useOrganisationStore } from '@/stores/organisation';
import { errorMessage } from '@/utils/error-message';
import { tripLanes, tripNames, type TripNames } from '@/utils/trip-board';
import { useAsyncAction } from './useAsyncAction';
import { useTripBoardEdits } from './useTripBoardEdits';
import { useWorkdayTide } from './useWorkdayTide';

async function loadBoard(id: string) {
  const [workday, stored, roster, fleet] = await Promise.all([fetchWorkday(id), fetchTripPlan(id), fetchRoster(id), listFleet()]);
  return { workday, stored, roster, fleet };
}

/**
 * A workday's trip board: the workday, its stored plan (null until built), the names behind the
 * plan's ids, the day's tide, building or re-planning, and hand edits checked by the server.
 */
export function useTripBoard(id: Ref<string>) {
  const organisation = useOrganisationStore();
  const workday = ref<WorkdayDto | null>(null);
  const stored = ref<StoredTripPlan | null>(null);
  const roster = ref<RosterRow[]>([]);
  const fleet = ref<Craft[]>([]);
  const { loading, error, run } = useAsyncAction(loadBoard, { not_found: "This workday wasn't found. It may have been removed." });

  async function reload(): Promise<void> {
    const next = await run(id.value);
    if (!next) return;
    roster.value = next.roster;
    fleet.value = next.fleet;
    stored.value = next.stored;
    workday.value = next.workday;
  }
  watch(id, () => {
    workday.value = null;
    stored.value = null;
    void reload();
  }, { immediate: true });

  const units = computed(() => (organisation.loaded ? organisation.units : null));
  const { tide, error: tideError, reload: reloadTide } = useWorkdayTide(workday, units);

  const empty: TripNames = { people: new Map(), craft: new Map() };
  const names = computed(() => (stored.value ? tripNames(stored.value.instance, roster.value, fleet.value) : empty));
  const lanes = computed(() => (stored.value ? tripLanes(stored.value, names.value) : []));

  const edits = useTripBoardEdits(id, stored, names);

  const building = ref(false);
  const buildError = ref<string | null>(null);
  async function build(): Promise<boolean> {
    building.value = true;
    buildError.value = null;
    try {
      stored.value = await buildTripPlan(id.value);
      edits.rejection.value = null;
      return true;
    } catch (err) {
      buildError.value = errorMessage(err, { not_found: "This workday wasn't found. It may have been removed." });
      return false;
    } finally {
      building.value = false;
    }
  }

  return { workday, stored, roster, fleet, loading, error, reload, tide, tideError, reloadTide, names, lanes, building, buildError, build, ...edits };
}
