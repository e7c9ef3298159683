import { reactive, ref, type Ref } from 'vue';
import { CreateCampaignBody, type UpdateCampaignBody } from '@shared/schemas/campaign.schema';
import { createCampaign, listManagedCampaigns, updateCampaign, type ManagedCampaign } from '@/api/campaigns';
import { toMajorUnits, toMinorUnits } from '@/utils/money';
import { useAsyncAction } from './useAsyncAction';
import { useFormSubmit } from './useFormSubmit';

export interface CampaignFormState {
  name: string;
  story: string;
  /** Price per tree as typed, in whole currency units. */
  price: number | null | undefined;
  goalTrees: number | null | undefined;
  startsOn: string;
  /** '' for a campaign with no end date. */
  endsOn: string;
  active: boolean;
}

/** The form as the campaign body the server expects; emptied number fields go as NaN so the schema names them. */
export function campaignBody(form: CampaignFormState, currency: string): CreateCampaignBody {
  return {
    name: form.name,
    story: form.story,
    priceCents: typeof form.price === 'number' ? toMinorUnits(form.price, currency) : Number.NaN,
    goalTrees: typeof form.goalTrees === 'number' ? form.goalTrees : Number.NaN,
    startsOn: form.startsOn,
    endsOn: form.endsOn || null,
    active: form.active,
  };
}

/** Only the fields that differ from the saved campaign, so an edit never rewrites what nobody touched. */
function changes(body: CreateCampaignBody, saved: ManagedCampaign): UpdateCampaignBody {
  const out: UpdateCampaignBody = {};
  if (body.name !== saved.name) out.name = body.name;
  if (body.story !== saved.story) out.story = body.story;
  if (body.priceCents !== saved.priceCents) out.priceCents = body.priceCents;
  if (body.goalTrees !== saved.goalTrees) out.goalTrees = body.goalTrees;
  if (body.startsOn !== saved.startsOn) out.startsOn = body.startsOn;
  if (body.endsOn !== saved.endsOn) out.endsOn = body.endsOn;
  if (body.active !== saved.active) out.active = body.active;
  return out;
}

export interface CampaignsAdmin {
  campaigns: Ref<ManagedCampaign[]>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  reload: () => Promise<void>;
  form: CampaignFormState;
  /** The campaign being edited; null while creating a new one. */
  editing: Ref<ManagedCampaign | null>;
  dialogOpen: Ref<boolean>;
  openNew: (today: string) => void;
  openEdit: (campaign: ManagedCampaign) => void;
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  saving: Ref<boolean>;
  save: () => Promise<boolean>;
}

/** The admin's campaign list, and the one form that creates or edits a campaign. */
export function useCampaignsAdmin(currency: () => string): CampaignsAdmin {
  const campaigns = ref<ManagedCampaign[]>([]);
  const editing = ref<ManagedCampaign | null>(null);
  const dialogOpen = ref(false);
  const form = reactive<CampaignFormState>({ name: '', story: '', price: 25, goalTrees: 100, startsOn: '', endsOn: '', active: true });
  const list = useAsyncAction(listManagedCampaigns);

  async function reload(): Promise<void> {
    const next = await list.run();
    if (next) campaigns.value = next;
  }

  function openNew(today: string): void {
    editing.value = null;
    Object.assign(form, { name: '', story: '', price: 25, goalTrees: 100, startsOn: today, endsOn: '', active: true });
    reset();
    dialogOpen.value = true;
  }

  function openEdit(c: ManagedCampaign): void {
    editing.value = c;
    Object.assign(form, {
      name: c.name, story: c.story, price: toMajorUnits(c.priceCents, currency()), goalTrees: c.goalTrees,
      startsOn: c.startsOn, endsOn: c.endsOn ?? '', active: c.active,
    });
    reset();
    dialogOpen.value = true;
  }

  const { fieldErrors, formError, submitting, submit } = useFormSubmit(CreateCampaignBody, async (body) => {
    const before = editing.value;
    if (before) {
      const diff = changes(body, before);
      if (Object.keys(diff).length === 0) return;
      const saved = await updateCampaign(before.id, diff);
      campaigns.value = campaigns.value.map((c) => (c.id === saved.id ? saved : c));
    } else {
      campaigns.value = [await createCampaign(body), ...campaigns.value];
    }
  }, { messages: { validation_failed: 'Some answers need another look.' } });

  function reset(): void {
    fieldErrors.value = {};
    formError.value = null;
  }

  async function save(): Promise<boolean> {
    const ok = await submit(campaignBody(form, currency()));
    if (ok) dialogOpen.value = false;
    return ok;
  }

  return {
    campaigns, loading: list.loading, error: list.error, reload, form, editing, dialogOpen, openNew, openEdit,
    fieldErrors, formError, saving: submitting, save,
  };
}
