import { reactive, ref, type Ref } from 'vue';
import { z } from 'zod';
import { Currency, GivingRules, type OrganisationSettings } from '@shared/schemas/organisation.schema';
import { updateOrganisationSettings } from '@/api/organisation';
import { useOrganisationStore } from '@/stores/organisation';
import { useFormSubmit } from './useFormSubmit';

export interface GivingForm {
  currency: string;
  cardFeePercent: number | undefined;
  cardFeeFixedCents: number | undefined;
}

const GivingCheck = z.object({ currency: Currency, givingRules: GivingRules });

export interface DonationSettings {
  form: GivingForm;
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  saved: Ref<boolean>;
  save: () => Promise<void>;
}

/** The giving part of the organisation settings (currency and card fee), saved on its own. */
export function useDonationSettings(settings: OrganisationSettings): DonationSettings {
  const organisation = useOrganisationStore();
  const form = reactive<GivingForm>({
    currency: settings.currency,
    cardFeePercent: settings.givingRules.cardFeePercent,
    cardFeeFixedCents: settings.givingRules.cardFeeFixedCents,
  });
  const saved = ref(false);
  const { fieldErrors, formError, submitting, submit } = useFormSubmit(
    GivingCheck,
    async (body) => organisation.setOrganisation(await updateOrganisationSettings(body)),
    { messages: { validation_failed: 'Some giving settings need another look.' } },
  );

  async function save(): Promise<void> {
    saved.value = false;
    const body = {
      currency: form.currency.trim().toLowerCase(),
      givingRules: { cardFeePercent: form.cardFeePercent, cardFeeFixedCents: form.cardFeeFixedCents },
    };
    saved.value = await submit(body);
  }

  return { form, fieldErrors, formError, saving: submitting, saved, save };
}
