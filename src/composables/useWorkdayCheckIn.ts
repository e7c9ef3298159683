import { computed, ref, type ComputedRef, type Ref } from 'vue';
import { HoursBody, type RosterRow } from '@shared/schemas/roster.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { checkIn, checkOut, correctHours, markNoShow } from '@/api/roster';
import { errorMessage } from '@/utils/error-message';
import { filterRoster } from '@/utils/workday-roster';
import { useFormSubmit, type FormSubmit } from './useFormSubmit';
import { useWorkdayRoster } from './useWorkdayRoster';

export type CheckInStep = 'check-in' | 'check-out' | 'no-show';

export interface CheckInCounts {
  expected: number;
  checkedIn: number;
  checkedOut: number;
  noShows: number;
}

export interface WorkdayCheckIn {
  workday: Ref<WorkdayDto | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  search: Ref<string>;
  /** Confirmed crew matching the search, by name. */
  cards: ComputedRef<RosterRow[]>;
  counts: ComputedRef<CheckInCounts>;
  waiting: ComputedRef<number>;
  busyId: Ref<string | null>;
  /** Runs one step, then reloads; resolves to the row as the server now has it, or to an error message. */
  act: (row: RosterRow, step: CheckInStep) => Promise<{ row: RosterRow | null } | { error: string }>;
  hours: Pick<FormSubmit, 'fieldErrors' | 'formError' | 'submitting'> & { submit: (row: RosterRow, minutes: number, reason: string) => Promise<boolean> };
}

const STEPS: Record<CheckInStep, (signupId: string) => Promise<void>> = { 'check-in': checkIn, 'check-out': checkOut, 'no-show': markNoShow };

/** Check-in at the launch: confirmed crew as cards, one step at a time, the roster reloaded after each. */
export function useWorkdayCheckIn(id: Ref<string>): WorkdayCheckIn {
  const { workday, roster, loading, error, reload } = useWorkdayRoster(id);
  const search = ref('');
  const busyId = ref<string | null>(null);
  const crew = computed(() => roster.value.filter((r) => r.status === 'confirmed'));
  const cards = computed(() => [...filterRoster(crew.value, { role: '', status: '', search: search.value })].sort((a, b) => a.name.localeCompare(b.name)));
  const waiting = computed(() => roster.value.length - crew.value.length);
  const counts = computed<CheckInCounts>(() => ({
    expected: crew.value.length,
    checkedIn: crew.value.filter((r) => r.checkedInAt !== null && !r.noShow).length,
    checkedOut: crew.value.filter((r) => r.checkedOutAt !== null && !r.noShow).length,
    noShows: crew.value.filter((r) => r.noShow).length,
  }));
  const find = (signupId: string) => roster.value.find((r) => r.signupId === signupId) ?? null;

  async function act(row: RosterRow, step: CheckInStep): Promise<{ row: RosterRow | null } | { error: string }> {
    busyId.value = row.signupId;
    try {
      await STEPS[step](row.signupId);
      await reload();
      return { row: find(row.signupId) };
    } catch (err) {
      void reload();
      return { error: errorMessage(err, { conflict: 'That step no longer fits: someone may have changed this person meanwhile. The list is reloaded.' }) };
    } finally {
      busyId.value = null;
    }
  }

  let target = '';
  const form = useFormSubmit(HoursBody, async (body) => {
    await correctHours(target, body);
    await reload();
  });
  const hours = {
    ...form,
    submit: (row: RosterRow, minutes: number, reason: string) => {
      target = row.signupId;
      return form.submit({ minutes, reason });
    },
  };

  return { workday, loading, error, reload, search, cards, counts, waiting, busyId, act, hours };
}
