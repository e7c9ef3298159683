import { computed, reactive, ref, type ComputedRef, type Ref } from 'vue';
import { SignupBody, type SignupResult } from '@shared/schemas/crew.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { ApiError } from '@/api/http';
import { fetchProfile } from '@/api/me';
import { fetchCurrentWaiver, signUp, type Waiver } from '@/api/signups';
import { errorMessage } from '@/utils/error-message';
import {
  SIGNUP_STEPS,
  emptySignupForm,
  isMinor,
  isUnderMinimumAge,
  prefillFromProfile,
  serverFieldErrors,
  stepOfField,
  toSignupBody,
  validateUpTo,
  type SignupContext,
  type SignupForm,
  type SignupFormStep,
  type SignupStep,
} from '@/utils/signup-form';
import type { WeightUnit } from '@/utils/weight';
import { workdayDateKey } from '@/utils/workday-format';
import { useAsyncAction } from './useAsyncAction';

export interface SignupStepper {
  step: Ref<SignupStep>;
  form: SignupForm;
  /** One message per SignupBody path, e.g. `guardian.phone`. */
  errors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  submitting: Ref<boolean>;
  result: Ref<SignupResult | null>;
  waiver: Ref<Waiver | null>;
  waiverError: Ref<string | null>;
  loadWaiver: () => Promise<void>;
  minor: ComputedRef<boolean>;
  tooYoung: ComputedRef<boolean>;
  start: () => Promise<void>;
  next: () => void;
  back: () => void;
  submit: () => Promise<void>;
}

const ERRORS = {
  not_found: 'This workday is no longer open for sign-up.',
  conflict: 'This workday has started, so sign-up has closed.',
};

/**
 * The sign-up stepper (role → about you → waiver → done): the form, each step checked with the
 * shared SignupBody before moving on, and server `fields` errors sent back to the step that shows them.
 */
export function useSignupStepper(workday: Ref<WorkdayDto>, weightUnit: Ref<WeightUnit>, onDone: (result: SignupResult) => void): SignupStepper {
  const step = ref<SignupStep>('role');
  const form = reactive<SignupForm>(emptySignupForm());
  const errors = ref<Record<string, string>>({});
  const formError = ref<string | null>(null);
  const submitting = ref(false);
  const result = ref<SignupResult | null>(null);
  const waiver = ref<Waiver | null>(null);
  const { error: waiverError, run: runWaiver } = useAsyncAction(fetchCurrentWaiver);
  const { run: runProfile } = useAsyncAction(fetchProfile);

  const ctx = computed<SignupContext>(() => ({
    day: workdayDateKey(workday.value),
    minimumAge: workday.value.minimumAge,
    weightUnit: weightUnit.value,
    waiverVersion: waiver.value?.version ?? null,
  }));
  const minor = computed(() => isMinor(form, ctx.value));
  const tooYoung = computed(() => isUnderMinimumAge(form, ctx.value));

  async function loadWaiver(): Promise<void> {
    const next = await runWaiver();
    if (next) waiver.value = next;
  }

  /** Loads the waiver and prefills from the profile; a profile that won't load just means typing more. */
  async function start(): Promise<void> {
    const [profile] = await Promise.all([runProfile(), loadWaiver()]);
    if (profile) prefillFromProfile(form, profile);
  }

  function go(to: SignupStep): void {
    step.value = to;
    formError.value = null;
  }

  function check(upTo: SignupFormStep): boolean {
    errors.value = validateUpTo(upTo, form, ctx.value);
    const keys = Object.keys(errors.value);
    if (keys.length === 0) return true;
    const first = (['role', 'about', 'waiver'] as const).find((s) => keys.some((k) => stepOfField(k) === s));
    if (first && first !== step.value) go(first);
    return false;
  }

  function next(): void {
    if (step.value === 'done' || step.value === 'waiver' || !check(step.value)) return;
    go(step.value === 'role' ? 'about' : 'waiver');
  }

  function back(): void {
    const index = SIGNUP_STEPS.findIndex((s) => s.id === step.value);
    const previous = SIGNUP_STEPS[index - 1];
    if (previous && step.value !== 'done') go(previous.id);
  }

  function showError(err: unknown): void {
    if (err instanceof ApiError && err.fields && Object.keys(err.fields).length > 0) {
      const { errors: fields, step: to, general } = serverFieldErrors(err.fields);
      if (err.code === 'conflict' && fields['waiver.version']) {
        form.waiver.accepted = false;
        void loadWaiver();
        go('waiver');
        formError.value = 'The waiver changed while you were reading it. Read the new version and accept it again.';
        return;
      }
      errors.value = fields;
      go(to);
      formError.value = general ?? errorMessage(err, ERRORS);
      return;
    }
    formError.value = errorMessage(err, ERRORS);
  }

  async function submit(): Promise<void> {
    if (submitting.value || !check('waiver')) return;
    const body = SignupBody.safeParse(toSignupBody(form, ctx.value));
    if (!body.success) return;
    submitting.value = true;
    formError.value = null;
    try {
      result.value = await signUp(workday.value.id, body.data);
      go('done');
      onDone(result.value);
    } catch (err) {
      showError(err);
    } finally {
      submitting.value = false;
    }
  }

  return { step, form, errors, formError, submitting, result, waiver, waiverError, loadWaiver, minor, tooYoung, start, next, back, submit };
}
