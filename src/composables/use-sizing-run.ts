/**
 * "Size it": sends the duty to the server, the authority, and keeps what came back: a result, an
 * explanation of why the duty cannot be met (422, the physics in words), or a failure message.
 */
import { ref } from 'vue';
import type { SizeRequest, SizeResult } from '@shared/schemas/thermal';
import { ApiError, errorMessage, isApiError } from '../api/http';
import { sizeCooler } from '../api/thermal';
import type { SizingForm } from './use-sizing-form';

export interface Explanation {
  code: string;
  message: string;
  /** request field the explanation is about, when the server named one */
  field?: string;
}

export function useSizingRun(form: SizingForm) {
  const result = ref<SizeResult | null>(null);
  /** the duty that `result` answers (the form may have changed since) */
  const sent = ref<SizeRequest | null>(null);
  const explanation = ref<Explanation | null>(null);
  const failure = ref<string | null>(null);
  const busy = ref(false);

  async function sizeIt(): Promise<boolean> {
    failure.value = null;
    const input = form.validate();
    if (!input) {
      failure.value = 'Some fields need attention: see the messages under them.';
      return false;
    }
    busy.value = true;
    try {
      result.value = await sizeCooler(input);
      sent.value = input;
      explanation.value = null;
      return true;
    } catch (error) {
      result.value = null;
      explanation.value = null;
      if (isApiError(error) && error.status === 422) {
        const field = Object.keys(error.fields)[0];
        explanation.value = { code: error.code, message: error.message, field };
        // The words under the field the physics is about (in the field's unit, issue 12), the panel says what to relax.
        if (field) form.applyServerError(new ApiError(422, error.code, error.message, { [field]: error.message }));
      } else {
        if (isApiError(error)) form.applyServerError(error);
        failure.value =
          isApiError(error) && error.status === 400
            ? 'The server did not accept some fields: see the messages under them.'
            : errorMessage(error);
      }
      return false;
    } finally {
      busy.value = false;
    }
  }

  return { result, sent, explanation, failure, busy, sizeIt };
}
