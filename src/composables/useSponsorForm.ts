import { reactive, ref, type ComputedRef, type Ref } from 'vue';
import { CheckoutBody, DONATION_LIMITS, type DedicationKind } from '@shared/schemas/donation.schema';
import type { CampaignPage } from '@/api/campaigns';
import { startCheckout } from '@/api/donations';
import { toMinorUnits } from '@/utils/money';
import { useFormSubmit } from './useFormSubmit';
import { useSponsorPricing, type GiftMode, type GiftSummary } from './useSponsorPricing';

export type WallChoice = 'name' | 'anonymous' | 'none';

export interface SponsorFormState {
  mode: GiftMode;
  /** Null or undefined while the field is empty. */
  trees: number | null | undefined;
  /** The custom amount as typed, in whole currency units (dollars), not cents. */
  amount: number | null | undefined;
  coverFees: boolean;
  dedicationKind: DedicationKind | 'none';
  dedicationName: string;
  name: string;
  email: string;
  wall: WallChoice;
  wantsUpdates: boolean;
}

export const MAX_TREES = DONATION_LIMITS.maxTrees;

/** The form as the checkout request the server expects (shared CheckoutBody). */
export function checkoutBody(form: SponsorFormState, campaignId: string, currency: string): Record<string, unknown> {
  const name = form.name.trim();
  // An emptied field is sent as NaN so the schema says "must be…" under it instead of dropping it.
  const gift = form.mode === 'trees'
    ? { trees: form.trees ?? Number.NaN }
    : { amountCents: typeof form.amount === 'number' ? toMinorUnits(form.amount, currency) : Number.NaN };
  const wallName = form.wall === 'name' ? name.slice(0, 80) : form.wall === 'anonymous' ? '' : null;
  return {
    campaignId,
    ...gift,
    coverFees: form.coverFees,
    donor: { name, email: form.email.trim() },
    ...(form.dedicationKind === 'none' ? {} : { dedication: { kind: form.dedicationKind, name: form.dedicationName } }),
    wallName,
    wantsUpdates: form.wantsUpdates,
  };
}

export interface SponsorForm {
  form: SponsorFormState;
  summary: ComputedRef<GiftSummary | null>;
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  /** True from the click until the browser has left for the checkout page. */
  busy: Ref<boolean>;
  submit: () => Promise<void>;
}

/** The donate form: its answers, the live price summary, and the hand-over to the hosted checkout. */
export function useSponsorForm(page: Ref<CampaignPage | null>): SponsorForm {
  const form = reactive<SponsorFormState>({
    mode: 'trees', trees: 1, amount: undefined, coverFees: true, dedicationKind: 'none', dedicationName: '',
    name: '', email: '', wall: 'name', wantsUpdates: false,
  });
  const summary = useSponsorPricing(
    () => ({
      mode: form.mode,
      trees: form.trees,
      amountCents: typeof form.amount === 'number' && page.value ? toMinorUnits(form.amount, page.value.currency) : 0,
      coverFees: form.coverFees,
    }),
    () => (page.value ? { priceCents: page.value.campaign.priceCents, fee: page.value.givingRules } : null),
  );
  let leaving = false;

  const { fieldErrors, formError, submit: send } = useFormSubmit(
    CheckoutBody,
    async (body) => {
      const { checkoutUrl } = await startCheckout(body);
      leaving = true;
      window.location.assign(checkoutUrl);
    },
    { messages: { validation_failed: 'Some answers need another look.' } },
  );
  const busy = ref(false);

  async function submit(): Promise<void> {
    if (!page.value || busy.value) return;
    busy.value = true;
    const ok = await send(checkoutBody(form, page.value.campaign.id, page.value.currency));
    // On success the page is about to unload; keep the button busy so nobody pays twice.
    busy.value = ok && leaving;
  }

  return { form, summary, fieldErrors, formError, busy, submit };
}
