import { computed, reactive, ref, type ComputedRef, type Ref } from 'vue';
import type { CraftKind } from '@shared/schemas/crew.schema';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import { CreateCraftBody, UpdateCraftBody, type Craft } from '@shared/schemas/trips.schema';
import { createCraft, updateCraft } from '@/api/fleet';
import { parseNumber } from '@/utils/site-form';
import { fromDisplayLength, toDisplayLength } from '@/utils/units';
import { fromKilograms, toKilograms, weightUnitFor, type WeightUnit } from '@/utils/weight';
import { useFormSubmit } from './useFormSubmit';

/** The craft form as typed: number boxes hold text in the organisation's units until sent. */
export interface FleetForm {
  name: string;
  kind: CraftKind;
  seats: string;
  maxLoad: string;
  hasCapacityPlate: boolean;
  potSlots: string;
  draft: string;
  speedKmh: string;
  needsOperator: boolean;
  active: boolean;
  notes: string;
}

const show = (n: number) => String(Number(n.toFixed(2)));

function emptyForm(): FleetForm {
  return { name: '', kind: 'sit-on-top-kayak', seats: '1', maxLoad: '', hasCapacityPlate: false, potSlots: '1', draft: '', speedKmh: '4', needsOperator: false, active: true, notes: '' };
}

function craftToForm(c: Craft, weight: WeightUnit, units: LengthUnit): FleetForm {
  return {
    name: c.name, kind: c.kind, seats: String(c.seats), maxLoad: show(fromKilograms(c.maxLoadKg, weight)), hasCapacityPlate: c.hasCapacityPlate,
    potSlots: String(c.potSlots), draft: c.draftM === null ? '' : show(toDisplayLength(c.draftM, units)), speedKmh: show(c.speedKmh),
    needsOperator: c.needsOperator, active: c.active, notes: c.notes,
  };
}

/** The body the API wants: kilograms, metres, numbers (unreadable text becomes NaN so the schema says so). */
function formToBody(f: FleetForm, weight: WeightUnit, units: LengthUnit) {
  const num = (text: string) => parseNumber(text);
  const maxLoad = num(f.maxLoad);
  const draft = num(f.draft);
  return {
    name: f.name, kind: f.kind, seats: num(f.seats), maxLoadKg: maxLoad === undefined || Number.isNaN(maxLoad) ? maxLoad : toKilograms(maxLoad, weight),
    hasCapacityPlate: f.hasCapacityPlate, potSlots: num(f.potSlots), draftM: draft === undefined ? null : fromDisplayLength(draft, units),
    speedKmh: num(f.speedKmh), needsOperator: f.needsOperator, active: f.active, notes: f.notes,
  };
}

export interface FleetFormState {
  form: FleetForm;
  fieldErrors: ComputedRef<Record<string, string>>;
  formError: ComputedRef<string | null>;
  submitting: ComputedRef<boolean>;
  /** The craft being edited, or null for a new one. */
  editing: Ref<Craft | null>;
  weightUnit: ComputedRef<WeightUnit>;
  open: (craft: Craft | null) => void;
  /** Resolves to the saved craft, or null when something needs another look. */
  save: () => Promise<Craft | null>;
}

/** Add or edit one craft; loads are typed in the organisation's weight unit and drafts in its length unit. */
export function useFleetForm(units: Ref<LengthUnit>): FleetFormState {
  const form = reactive<FleetForm>(emptyForm());
  const editing = ref<Craft | null>(null);
  const weightUnit = computed(() => weightUnitFor(units.value));
  let saved: Craft | null = null;

  const options = { fieldFor: { conflict: 'name' }, messages: { conflict: 'Another craft already has this name.' } } as const;
  const creating = useFormSubmit(CreateCraftBody, async (body) => { saved = await createCraft(body); }, options);
  const updating = useFormSubmit(UpdateCraftBody, async (body) => { saved = await updateCraft(editing.value?.id ?? '', body); }, options);
  const current = computed(() => (editing.value ? updating : creating));

  function open(craft: Craft | null): void {
    editing.value = craft;
    Object.assign(form, craft ? craftToForm(craft, weightUnit.value, units.value) : emptyForm());
    for (const s of [creating, updating]) {
      s.fieldErrors.value = {};
      s.formError.value = null;
    }
  }

  async function save(): Promise<Craft | null> {
    saved = null;
    const ok = await current.value.submit(formToBody(form, weightUnit.value, units.value));
    return ok ? saved : null;
  }

  return {
    form, editing, weightUnit, open, save,
    fieldErrors: computed(() => current.value.fieldErrors.value),
    formError: computed(() => current.value.formError.value),
    submitting: computed(() => current.value.submitting.value),
  };
}
