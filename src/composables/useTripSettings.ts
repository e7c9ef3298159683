import { computed, reactive, ref, type ComputedRef, type Ref } from 'vue';
import { z } from 'zod';
import { TripRules, type OrganisationSettings } from '@shared/schemas/organisation.schema';
import { updateOrganisationSettings } from '@/api/organisation';
import { useFormSubmit } from './useFormSubmit';

/** The trip settings as typed: the two margins in percent, the rest in kg and minutes. */
export interface TripSettingsForm {
  paddlecraftPercent: number | undefined;
  platedPercent: number | undefined;
  standardPersonKg: number | undefined;
  plantingMinutesPerTree: number | undefined;
  potMassKg: number | undefined;
  loadMinutes: number | undefined;
  unloadMinutes: number | undefined;
}

const TripRulesCheck = z.object({ tripRules: TripRules });
const MARGIN_MESSAGE = 'Must be between 10 % and 100 %';

export interface TripSettings {
  form: TripSettingsForm;
  /** Keyed by form field (`paddlecraftPercent`, `potMassKg`, …). */
  errors: ComputedRef<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  saved: Ref<boolean>;
  save: () => Promise<void>;
}

const percent = (share: number) => Math.round(share * 1000) / 10;
const share = (pct: number | undefined) => (pct === undefined ? undefined : Math.round(pct * 10) / 1000);

/** The trip-planning part of the organisation settings, saved on its own. */
export function useTripSettings(settings: OrganisationSettings): TripSettings {
  const r = settings.tripRules;
  const form = reactive<TripSettingsForm>({
    paddlecraftPercent: percent(r.paddlecraftMargin),
    platedPercent: percent(r.platedMargin),
    standardPersonKg: r.standardPersonKg,
    plantingMinutesPerTree: r.plantingMinutesPerTree,
    potMassKg: r.potMassKg,
    loadMinutes: r.loadMinutes,
    unloadMinutes: r.unloadMinutes,
  });
  const saved = ref(false);
  const { fieldErrors, formError, submitting, submit } = useFormSubmit(TripRulesCheck, (body) => updateOrganisationSettings(body), {
    messages: { validation_failed: 'Some trip settings need another look.' },
  });

  const errors = computed(() => {
    const out: Record<string, string> = {};
    for (const [key, message] of Object.entries(fieldErrors.value)) {
      const field = key.replace(/^tripRules\./, '');
      if (field === 'paddlecraftMargin') out.paddlecraftPercent = MARGIN_MESSAGE;
      else if (field === 'platedMargin') out.platedPercent = MARGIN_MESSAGE;
      else out[field] = message;
    }
    return out;
  });

  async function save(): Promise<void> {
    saved.value = false;
    const { paddlecraftPercent, platedPercent, ...rest } = form;
    saved.value = await submit({ tripRules: { ...rest, paddlecraftMargin: share(paddlecraftPercent), platedMargin: share(platedPercent) } });
  }

  return { form, errors, formError, saving: submitting, saved, save };
}
