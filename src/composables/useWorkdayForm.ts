import { computed, getCurrentInstance, provide, reactive, ref, type ComputedRef, type Ref } from 'vue';
import type { Site } from '@shared/schemas/site.schema';
import { CreateWorkdayBody, UpdateWorkdayBody, type WorkdayDto } from '@shared/schemas/workday.schema';
import { listSites } from '@/api/sites';
import { createWorkday, fetchWorkday, publishWorkday, updateWorkday } from '@/api/workdays';
import { useOrganisationStore } from '@/stores/organisation';
import {
  emptyWorkdayForm,
  formSpan,
  formToCreateBody,
  formToUpdateBody,
  plainMessage,
  roleCapsBody,
  workdayToForm,
  type RoleCapBody,
  type WorkdayForm,
  type WorkdayPrefill,
} from '@/utils/workday-form';
import { useAsyncAction } from './useAsyncAction';
import { DAY_CAPACITY_KEY, useDayCapacity, type DayCapacityState } from './useDayCapacity';
import { useFormSubmit } from './useFormSubmit';

/** How saving ends: a draft, published, or (editing) the status it already has. */
export type WorkdaySaveMode = 'draft' | 'published' | 'keep';

export interface WorkdayFormState {
  form: WorkdayForm;
  sites: Ref<Site[]>;
  site: ComputedRef<Site | null>;
  /** The zone the day and times are typed in: the chosen site's. */
  timeZone: ComputedRef<string>;
  workday: Ref<WorkdayDto | null>;
  ready: Ref<boolean>;
  loading: Ref<boolean>;
  loadError: Ref<string | null>;
  load: () => Promise<void>;
  /** Keyed by form box (`roleCaps.planter` for a role's cap), in plain words. */
  errors: ComputedRef<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  /** For a published workday: what the crew will be e-mailed about ('time', 'place'). */
  crewNotice: ComputedRef<string[]>;
  /** Resolves to the saved workday's id, or null when it was not saved (the errors say why). */
  save: (mode: WorkdaySaveMode) => Promise<string | null>;
  /** What the chosen site, day and times can plant and the crew per role it needs (also provided to the crew section). */
  dayCapacity: DayCapacityState;
}

const MESSAGES = {
  validation_failed: 'Some answers need another look; see the notes under the fields.',
  conflict: 'This workday can no longer be changed that way: it may have been cancelled, completed or already published.',
  not_found: "The workday or its site wasn't found. It may have been removed.",
};

function copy(form: WorkdayForm): WorkdayForm {
  return { ...form, roleCaps: { ...form.roleCaps } };
}

/** The new-workday and edit-workday form: site-zone times in, ISO UTC out, validated by the shared schemas. */
export function useWorkdayForm(workdayId: string | null, prefill: WorkdayPrefill): WorkdayFormState {
  const organisation = useOrganisationStore();
  const form = reactive<WorkdayForm>(emptyWorkdayForm({}, organisation.timeZone));
  let initial = copy(form);
  const sites = ref<Site[]>([]);
  const workday = ref<WorkdayDto | null>(null);
  const ready = ref(false);
  const site = computed(() => sites.value.find((s) => s.id === form.siteId) ?? null);
  const timeZone = computed(() => site.value?.timeZone ?? workday.value?.site.timeZone ?? organisation.timeZone);
  const dayCapacity = useDayCapacity({ form, timeZone, saved: workday });
  if (getCurrentInstance()) provide(DAY_CAPACITY_KEY, dayCapacity);

  const { loading, error: loadError, run } = useAsyncAction(async () => {
    if (!organisation.loaded) await organisation.load();
    const [rows, saved] = await Promise.all([listSites(), workdayId ? fetchWorkday(workdayId) : Promise.resolve(null)]);
    sites.value = rows;
    workday.value = saved;
    if (saved) Object.assign(form, workdayToForm(saved));
    else {
      const chosen = rows.find((s) => s.id === prefill.siteId) ?? (rows.length === 1 ? rows[0] : undefined);
      Object.assign(form, emptyWorkdayForm({ ...prefill, siteId: chosen?.id ?? '' }, chosen?.timeZone ?? organisation.timeZone));
    }
    initial = copy(form);
  }, { not_found: "This workday wasn't found. It may have been removed." });

  async function load(): Promise<void> {
    ready.value = false;
    await run();
    ready.value = loadError.value === null;
  }

  const savedId = ref<string | null>(null);
  let publishAfter = false;
  let sentRoles: RoleCapBody = [];
  const submitter =
    workdayId === null
      ? useFormSubmit(CreateWorkdayBody, async (body) => {
          savedId.value = (await createWorkday(body)).id;
        }, { messages: MESSAGES })
      : useFormSubmit(UpdateWorkdayBody, async (body) => {
          let next = Object.keys(body).length > 0 ? await updateWorkday(workdayId, body) : workday.value;
          if (publishAfter) next = await publishWorkday(workdayId);
          workday.value = next;
          savedId.value = workdayId;
        }, { messages: MESSAGES });
  const { fieldErrors, formError, submitting } = submitter;

  const errors = computed(() => {
    const out: Record<string, string> = {};
    for (const [key, message] of Object.entries(fieldErrors.value)) {
      const roleIndex = /^roles\.(\d+)/.exec(key);
      const role = roleIndex ? sentRoles[Number(roleIndex[1])]?.role : undefined;
      out[role ? `roleCaps.${role}` : key] = plainMessage(message);
    }
    return out;
  });

  const crewNotice = computed(() => {
    if (workday.value?.status !== 'published') return [];
    const now = formSpan(form, timeZone.value);
    const before = formSpan(initial, workday.value.site.timeZone);
    const notice: string[] = [];
    if (now.startsAt !== before.startsAt || now.endsAt !== before.endsAt) notice.push('time');
    if (form.siteId !== initial.siteId || form.meetingPoint !== initial.meetingPoint) notice.push('place');
    return notice;
  });

  async function save(mode: WorkdaySaveMode): Promise<string | null> {
    savedId.value = null;
    formError.value = null;
    if (form.capEachRole && roleCapsBody(form).length === 0) {
      fieldErrors.value = { roles: 'Give at least one role a place, or turn off “Cap each role”.' };
      return null;
    }
    sentRoles = form.capEachRole ? roleCapsBody(form) : [];
    publishAfter = mode === 'published' && workday.value?.status === 'draft';
    const body = workday.value
      ? formToUpdateBody(form, initial, timeZone.value, workday.value.site.timeZone)
      : formToCreateBody(form, timeZone.value, mode === 'published' ? 'published' : 'draft');
    if (!(await submitter.submit(body))) return null;
    if (workday.value) Object.assign(form, workdayToForm(workday.value));
    initial = copy(form);
    return savedId.value;
  }

  return { form, sites, site, timeZone, workday, ready, loading, loadError, load, errors, formError, saving: submitting, crewNotice, save, dayCapacity };
}
