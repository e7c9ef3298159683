import { reactive, ref, watch, type Ref } from 'vue';
import { CreateVisitBody } from '@shared/schemas/outcomes.schema';
import type { Site } from '@shared/schemas/site.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { createVisit, type VisitDto } from '@/api/monitoring';
import { listSites } from '@/api/sites';
import { listWorkdays } from '@/api/workdays';
import { useFormSubmit, type FormSubmit } from './useFormSubmit';

export interface StartVisitForm {
  siteId: string;
  visitedOn: string;
  workdayId: string;
  notes: string;
}

/** Starting a monitoring visit: the site, the date (today unless told), an optional monitoring workday, notes. */
export function useMonitoringStart(today: () => string): Pick<FormSubmit, 'fieldErrors' | 'formError' | 'submitting'> & {
  form: StartVisitForm;
  sites: Ref<Site[]>;
  workdays: Ref<WorkdayDto[]>;
  loadSites: () => Promise<void>;
  /** Resolves to the new visit, or null when it wasn't created (the messages say why). */
  start: () => Promise<VisitDto | null>;
} {
  const form = reactive<StartVisitForm>({ siteId: '', visitedOn: today(), workdayId: '', notes: '' });
  const sites = ref<Site[]>([]);
  const workdays = ref<WorkdayDto[]>([]);
  let created: VisitDto | null = null;
  const { fieldErrors, formError, submitting, submit } = useFormSubmit(CreateVisitBody, async (body) => (created = await createVisit(body)), {
    messages: { validation_failed: 'Some answers need another look.' },
  });

  async function loadSites(): Promise<void> {
    // The form still works by hand if the list fails: the error shows as the site field's message.
    sites.value = await listSites().catch(() => []);
    if (!form.siteId && sites.value.length === 1) form.siteId = sites.value[0]!.id;
  }

  // Monitoring workdays at the chosen site that could hold this visit (not cancelled).
  watch(() => form.siteId, async (siteId) => {
    form.workdayId = '';
    workdays.value = siteId ? (await listWorkdays({ kind: 'monitoring', siteId }).catch(() => [])).filter((w) => w.status !== 'cancelled' && w.status !== 'draft') : [];
  });

  async function start(): Promise<VisitDto | null> {
    created = null;
    if (!form.siteId) {
      fieldErrors.value = { siteId: 'Choose the site you visited.' };
      return null;
    }
    const ok = await submit({ siteId: form.siteId, visitedOn: form.visitedOn, notes: form.notes, ...(form.workdayId && { workdayId: form.workdayId }) });
    return ok ? created : null;
  }

  return { form, sites, workdays, loadSites, start, fieldErrors, formError, submitting };
}
