/**
 * The one adapter from zod schemas to naive-ui form feedback.
 * `validate()` parses the model with the schema and returns the parsed (trimmed, lower-cased …) data,
 * or null after putting each issue's message on its field. Server field errors land the same way.
 */
import { reactive, ref, watch, type Ref } from 'vue';
import type { z } from 'zod';
import type { ApiError } from '../api/http';

export interface ZodForm<S extends z.ZodType> {
  /** Message per field path ("email", "address.city"); the form-wide message, if any, is under "". */
  errors: Record<string, string>;
  /** True once the user has tried to submit; from then on edits re-validate as they type. */
  submitted: Ref<boolean>;
  validate(): z.output<S> | null;
  feedback(field: string): string | undefined;
  status(field: string): 'error' | undefined;
  applyServerError(error: ApiError): void;
  reset(): void;
}

export function useZodForm<S extends z.ZodType>(schema: S, model: object): ZodForm<S> {
  const errors = reactive<Record<string, string>>({});
  const submitted = ref(false);

  function clear(): void {
    for (const key of Object.keys(errors)) delete errors[key];
  }

  function run(): z.output<S> | null {
    const result = schema.safeParse(toInput(model));
    clear();
    if (result.success) return result.data;
    for (const issue of result.error.issues) {
      const key = issue.path.map(String).join('.');
      errors[key] ??= issue.message;
    }
    return null;
  }

  function validate(): z.output<S> | null {
    submitted.value = true;
    return run();
  }

  watch(
    () => JSON.stringify(model),
    () => {
      if (submitted.value) run();
    },
  );

  return {
    errors,
    submitted,
    validate,
    feedback: (field) => errors[field],
    status: (field) => (errors[field] ? 'error' : undefined),
    applyServerError(error) {
      for (const [key, message] of Object.entries(error.fields)) errors[key] = message;
    },
    reset() {
      submitted.value = false;
      clear();
    },
  };
}

/** Empty optional inputs mean "not given": drop '' and null so optional schema fields stay undefined. */
function toInput(model: object): Record<string, unknown> {
  const input: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(model)) {
    if (value === '' || value === null || value === undefined) continue;
    input[key] = value;
  }
  return input;
}
