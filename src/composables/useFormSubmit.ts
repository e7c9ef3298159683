import { ref, type Ref } from 'vue';
import type { z } from 'zod';
import { fieldsFromIssues, type ErrorCode } from '@shared/errors';
import { ApiError } from '@/api/http';
import { errorMessage, sentence, type ErrorMessages } from '@/utils/error-message';

export interface FormSubmitOptions {
  /** Friendlier text per error code, shown above the form. */
  messages?: ErrorMessages;
  /** Show these codes under a field instead of above the form (e.g. `conflict` → `email`). */
  fieldFor?: Partial<Record<ErrorCode, string>>;
}

export interface FormSubmit {
  /** One message per field path, the same keys as an ErrorBody's `fields`. */
  fieldErrors: Ref<Record<string, string>>;
  formError: Ref<string | null>;
  submitting: Ref<boolean>;
  /** Validates `input` with the schema, then runs the action; resolves true when it succeeded. */
  submit: (input: unknown) => Promise<boolean>;
}

function firstMessages(fields: Record<string, string[]>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, messages] of Object.entries(fields)) {
    if (messages[0]) out[key] = sentence(messages[0]);
  }
  return out;
}

/**
 * Client-side `safeParse` and server `fields` take the same path onto `el-form-item :error`.
 * @example const { fieldErrors, formError, submitting, submit } = useFormSubmit(LoginBody, (body) => session.login(body));
 */
export function useFormSubmit<S extends z.ZodType>(
  schema: S,
  action: (body: z.output<S>) => Promise<unknown>,
  options: FormSubmitOptions = {},
): FormSubmit {
  const fieldErrors = ref<Record<string, string>>({});
  const formError = ref<string | null>(null);
  const submitting = ref(false);

  function showApiError(err: unknown): void {
    const field = err instanceof ApiError ? options.fieldFor?.[err.code] : undefined;
    const message = errorMessage(err, options.messages);
    if (field) fieldErrors.value = { [field]: message };
    else if (err instanceof ApiError && err.fields && Object.keys(err.fields).length > 0) {
      const { _: general, ...perField } = firstMessages(err.fields);
      fieldErrors.value = perField;
      formError.value = options.messages?.[err.code] ?? general ?? null;
    } else formError.value = message;
  }

  async function submit(input: unknown): Promise<boolean> {
    fieldErrors.value = {};
    formError.value = null;
    const parsed = schema.safeParse(input);
    if (!parsed.success) {
      fieldErrors.value = firstMessages(fieldsFromIssues(parsed.error.issues));
      return false;
    }
    submitting.value = true;
    try {
      await action(parsed.data);
      return true;
    } catch (err) {
      showApiError(err);
      return false;
    } finally {
      submitting.value = false;
    }
  }

  return { fieldErrors, formError, submitting, submit };
}
