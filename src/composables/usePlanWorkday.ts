import { computed, reactive, ref, type ComputedRef, type Ref } from 'vue';
import { z } from 'zod';
import type { Site } from '@shared/schemas/site.schema';
import type { LowWaterWindowDto } from '@shared/schemas/tide.schema';
import { WorkdayKind } from '@shared/schemas/workday.schema';
import { createWorkday, listDraftWorkdays, type WorkdayDraft } from '@/api/workdays';
import { useAsyncAction } from './useAsyncAction';
import { useFormSubmit } from './useFormSubmit';

const PlanBody = z.object({
  siteId: z.string().min(1),
  startsAt: z.string().min(1),
  endsAt: z.string().min(1),
  title: z.string().trim().min(1, { message: 'is required' }).max(160, { message: 'must be at most 160 characters' }),
  kind: WorkdayKind,
});

export interface PlanWorkday {
  /** The window being planned; the dialog is open while it is set. */
  planning: Ref<LowWaterWindowDto | null>;
  form: { title: string; kind: WorkdayKind };
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  /** The draft just made, for the confirmation. */
  created: Ref<WorkdayDraft | null>;
  open: (window: LowWaterWindowDto) => void;
  close: () => void;
  submit: () => Promise<void>;
  drafts: ComputedRef<WorkdayDraft[]>;
  draftsLoading: Ref<boolean>;
  draftsError: Ref<string | null>;
  loadDrafts: () => Promise<void>;
}

/** "Plan a workday" on a low-water window: a draft workday for that site, start and end, and the site's drafts. */
export function usePlanWorkday(site: Ref<Site | null>): PlanWorkday {
  const planning = ref<LowWaterWindowDto | null>(null);
  const form = reactive<{ title: string; kind: WorkdayKind }>({ title: '', kind: 'planting' });
  const created = ref<WorkdayDraft | null>(null);
  const allDrafts = ref<WorkdayDraft[]>([]);
  const drafts = computed(() =>
    allDrafts.value.filter((d) => d.siteId === site.value?.id).sort((a, b) => a.startsAt.localeCompare(b.startsAt)),
  );

  const { loading: draftsLoading, error: draftsError, run } = useAsyncAction(listDraftWorkdays);
  async function loadDrafts(): Promise<void> {
    if (!site.value) return;
    const rows = await run(site.value.id);
    if (rows) allDrafts.value = rows;
  }

  const { fieldErrors, formError, submitting, submit: send } = useFormSubmit(
    PlanBody,
    async (body) => {
      const draft = await createWorkday(body);
      created.value = draft;
      allDrafts.value = [draft, ...allDrafts.value.filter((d) => d.id !== draft.id)];
    },
    { messages: { forbidden: 'Only coordinators and admins can plan workdays.' } },
  );

  function open(window: LowWaterWindowDto): void {
    planning.value = window;
    created.value = null;
    fieldErrors.value = {};
    formError.value = null;
    form.title = site.value ? `Planting at ${site.value.name}` : 'Planting';
    form.kind = 'planting';
  }

  function close(): void {
    planning.value = null;
  }

  async function submit(): Promise<void> {
    const window = planning.value;
    if (!window || !site.value) return;
    const ok = await send({ siteId: site.value.id, startsAt: window.start, endsAt: window.end, title: form.title, kind: form.kind });
    if (ok) planning.value = null;
  }

  return { planning, form, fieldErrors, formError, saving: submitting, created, open, close, submit, drafts, draftsLoading, draftsError, loadDrafts };
}
