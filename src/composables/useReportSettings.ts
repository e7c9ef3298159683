import { reactive, ref, type Ref } from 'vue';
import { z } from 'zod';
import type { OrganisationSettings } from '@shared/schemas/organisation.schema';
import { updateOrganisationSettings } from '@/api/organisation';
import { useOrganisationStore } from '@/stores/organisation';
import { toMajorUnits, toMinorUnits } from '@/utils/money';
import { useFormSubmit } from './useFormSubmit';

export interface ReportSettingsForm {
  /** Major units as typed (dollars), undefined when cleared. */
  hourValue: number | undefined;
  source: string;
}

const ReportSettingsCheck = z.object({
  volunteerHourValueCents: z.number({ message: 'Type the value of an hour' }).int().min(0, { message: 'Must be at least 0' }).max(100_000, { message: 'Must be at most 1,000 an hour' }),
  volunteerHourValueSource: z.string().trim().min(1, { message: 'Say where the figure comes from, and its year' }).max(200),
});

/** The value of a volunteer hour and where that figure comes from, saved on their own. */
export function useReportSettings(settings: OrganisationSettings): {
  form: ReportSettingsForm;
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  saved: Ref<boolean>;
  save: () => Promise<void>;
} {
  const organisation = useOrganisationStore();
  const form = reactive<ReportSettingsForm>({
    hourValue: toMajorUnits(settings.volunteerHourValueCents, settings.currency),
    source: settings.volunteerHourValueSource,
  });
  const saved = ref(false);
  const { fieldErrors, formError, submitting, submit } = useFormSubmit(
    ReportSettingsCheck,
    async (body) => organisation.setOrganisation(await updateOrganisationSettings(body)),
    { messages: { validation_failed: 'The hour value needs another look.' } },
  );

  async function save(): Promise<void> {
    saved.value = false;
    saved.value = await submit({
      volunteerHourValueCents: form.hourValue === undefined ? undefined : toMinorUnits(form.hourValue, settings.currency),
      volunteerHourValueSource: form.source,
    });
  }

  return { form, fieldErrors, formError, saving: submitting, saved, save };
}
