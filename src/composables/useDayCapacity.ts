import { computed, onScopeDispose, ref, watch, type ComputedRef, type InjectionKey, type Ref } from 'vue';
import type { DayCapacity } from '@shared/schemas/trip-capacity.schema';
import { estimateDayCapacity, fetchWorkdayCapacity } from '@/api/day-capacity';
import { errorMessage } from '@/utils/error-message';
import { applyRoleNeeds, formSpan, type WorkdayForm } from '@/utils/workday-form';

export interface DayCapacityState {
  capacity: Ref<DayCapacity | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  /** A planting day with a site, a day and both times: an estimate can be asked for. */
  ready: ComputedRef<boolean>;
  /** The site's zone, for showing the estimate's times. */
  timeZone: ComputedRef<string>;
  /** True once the estimate was copied into the caps, until the estimate changes. */
  applied: Ref<boolean>;
  /** Copies the estimate into the per-role caps and the total cap. */
  apply: () => void;
}

/** How the workday form hands the estimate to its crew section (provided by `useWorkdayForm`). */
export const DAY_CAPACITY_KEY: InjectionKey<DayCapacityState> = Symbol('day-capacity');

interface SavedSpan {
  id: string;
  siteId: string;
  startsAt: string;
  endsAt: string;
}

const sameInstant = (a: string, b: string) => Date.parse(a) === Date.parse(b);

/**
 * The capacity of the day being edited, asked again (after a short pause in typing) whenever
 * the site, day or times change. A saved workday still at its saved site and times is asked by
 * id, so its own kayaks signed up and reserved trees count; anything else by window and site.
 */
export function useDayCapacity(opts: { form: WorkdayForm; timeZone: ComputedRef<string>; saved: Ref<SavedSpan | null>; delayMs?: number }): DayCapacityState {
  const { form } = opts;
  const capacity = ref<DayCapacity | null>(null);
  const loading = ref(false);
  const error = ref<string | null>(null);
  const applied = ref(false);
  const span = computed(() => formSpan(form, opts.timeZone.value));
  const ready = computed(() => form.kind === 'planting' && form.siteId !== '' && span.value.startsAt !== '' && span.value.endsAt !== '' && Date.parse(span.value.endsAt) > Date.parse(span.value.startsAt));
  let asked = 0;
  let timer: ReturnType<typeof setTimeout> | undefined;

  async function ask(): Promise<void> {
    const mine = ++asked;
    if (!ready.value) {
      capacity.value = null;
      return;
    }
    const { startsAt, endsAt } = span.value;
    const saved = opts.saved.value;
    const asSaved = saved && saved.siteId === form.siteId && sameInstant(saved.startsAt, startsAt) && sameInstant(saved.endsAt, endsAt);
    loading.value = true;
    error.value = null;
    try {
      const next = asSaved ? await fetchWorkdayCapacity(saved.id) : await estimateDayCapacity({ window: { start: startsAt, end: endsAt }, siteId: form.siteId });
      if (mine !== asked) return;
      capacity.value = next;
      applied.value = false;
    } catch (err) {
      if (mine === asked) error.value = errorMessage(err);
    } finally {
      if (mine === asked) loading.value = false;
    }
  }

  watch(
    () => [ready.value, form.siteId, span.value.startsAt, span.value.endsAt],
    () => {
      clearTimeout(timer);
      timer = setTimeout(() => void ask(), opts.delayMs ?? 400);
    },
  );
  onScopeDispose(() => clearTimeout(timer));

  function apply(): void {
    if (!capacity.value) return;
    applyRoleNeeds(form, capacity.value.roles);
    applied.value = true;
  }

  return { capacity, loading, error, ready, timeZone: opts.timeZone, applied, apply };
}
