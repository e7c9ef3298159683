import { reactive, ref, type Ref } from 'vue';
import { DEFAULT_NURSERY_RULES } from '@shared/schemas/nursery.schema';
import { UpdateOrganisationBody, type OrganisationSettings } from '@shared/schemas/organisation.schema';
import { fetchOrganisationSettings, updateOrganisationSettings } from '@/api/organisation';
import { useOrganisationStore } from '@/stores/organisation';
import { useAsyncAction } from './useAsyncAction';
import { useFormSubmit } from './useFormSubmit';

/** The settings an admin can change; `isDemo` is set by the seed and only shown. */
export type SettingsForm = Pick<OrganisationSettings, 'name' | 'legalName' | 'taxId' | 'contactEmail' | 'units' | 'timeZone' | 'windowWeights' | 'nurseryRules'>;

const FIELDS: readonly (keyof SettingsForm)[] = ['name', 'legalName', 'taxId', 'contactEmail', 'units', 'timeZone', 'windowWeights', 'nurseryRules'];

/** Only what differs from the saved settings, so a PATCH never rewrites a value nobody touched. */
function changes(form: SettingsForm, saved: OrganisationSettings): Partial<SettingsForm> {
  // The two rule groups are objects: compare them by value.
  const differs = (key: keyof SettingsForm) => JSON.stringify(form[key]) !== JSON.stringify(saved[key]);
  return Object.fromEntries(FIELDS.filter(differs).map((key) => [key, form[key]]));
}

export interface OrganisationSettingsState {
  settings: Ref<OrganisationSettings | null>;
  form: SettingsForm;
  loading: Ref<boolean>;
  loadError: Ref<string | null>;
  reload: () => Promise<void>;
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  /** True after the last save went through; cleared when the next one starts. */
  saved: Ref<boolean>;
  save: () => Promise<void>;
}

/** Loads the organisation's settings for the admin form and saves the changes, keeping the shell in step. */
export function useOrganisationSettings(): OrganisationSettingsState {
  const organisation = useOrganisationStore();
  const settings = ref<OrganisationSettings | null>(null);
  const form = reactive<SettingsForm>({
    name: '', legalName: '', taxId: '', contactEmail: '', units: 'ft', timeZone: '',
    windowWeights: { duration: 0.4, lowWater: 0.2, weekend: 0.25, startHour: 0.15 }, nurseryRules: { ...DEFAULT_NURSERY_RULES },
  });
  const saved = ref(false);

  function show(next: OrganisationSettings): void {
    settings.value = next;
    const { name, legalName, taxId, contactEmail, units, timeZone, windowWeights, nurseryRules } = next;
    Object.assign(form, { name, legalName, taxId, contactEmail, units, timeZone, windowWeights: { ...windowWeights }, nurseryRules: { ...nurseryRules } });
  }

  const { loading, error: loadError, run } = useAsyncAction(fetchOrganisationSettings);

  async function reload(): Promise<void> {
    const next = await run();
    if (next) show(next);
  }

  const { fieldErrors, formError, submitting, submit } = useFormSubmit(
    UpdateOrganisationBody,
    async (body) => {
      const next = await updateOrganisationSettings(body);
      show(next);
      organisation.setOrganisation(next);
    },
    { messages: { validation_failed: 'Some settings need another look.' } },
  );

  async function save(): Promise<void> {
    saved.value = false;
    if (!settings.value) return;
    saved.value = await submit(changes(form, settings.value));
  }

  return { settings, form, loading, loadError, reload, fieldErrors, formError, saving: submitting, saved, save };
}
