/**
 * A customer's new request: the sizing page's duty form plus quantity, need-by date, reference and
 * site notes (checked by the same `createQuoteSchema` the server uses), then the files to attach.
 * On submit the server sizes and prices at once; 400 field errors land under their fields (the duty's
 * keyed `duty.process.…` by the server, `process.…` by the duty form), a 422 becomes the one
 * explanation of why the duty cannot be met. Files go up right after the quote exists.
 * One idempotency key per form, sent again on every retry: a retry after a lost answer gets the
 * quote the first attempt stored, never a second one.
 */
import { reactive, ref } from 'vue';
import { createQuoteSchema, type ChosenDesign, type DesignChoice, type QuoteDetail } from '@shared/schemas/quotes';
import type { OperatingCase } from '@shared/schemas/thermal';
import { ApiError, errorMessage, isApiError, type FieldErrors } from '../api/http';
import { createQuote } from '../api/quotes';
import { useQuoteUploads } from './use-quote-uploads';
import { useSizingForm } from './use-sizing-form';
import { flowFields } from '@shared/thermal/flow-units';
import { quantityToSI, type Quantity } from './use-units';
import type { Explanation } from './use-sizing-run';
import { useZodForm } from './use-zod-form';

const detailsSchema = createQuoteSchema.omit({ duty: true });
const DUTY_PREFIX = 'duty.';
const DUTY_ROOTS = ['process.', 'boundary.', 'constraints.', 'correlation', 'cases'];

/** Splits server field errors into the duty form's (without `duty.`) and the details'. */
function splitFields(fields: FieldErrors): { duty: FieldErrors; details: FieldErrors } {
  const duty: FieldErrors = {};
  const details: FieldErrors = {};
  for (const [key, message] of Object.entries(fields)) {
    const path = key.startsWith(DUTY_PREFIX) ? key.slice(DUTY_PREFIX.length) : key;
    if (key.startsWith(DUTY_PREFIX) || DUTY_ROOTS.some((root) => path.startsWith(root))) duty[path] = message;
    else details[path] = message;
  }
  return { duty, details };
}

/** A random key; `randomUUID` exists only in secure contexts (https, localhost), so fall back to random bytes. */
function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, '0')).join('');
}

/** One operating case as the request page edits it (issue 11); an empty quantity keeps the design point's value. */
export interface CaseRow {
  name: string;
  coolantInletTemp: Quantity;
  coolantFlow: Quantity;
  processFlow: Quantity;
}

/** The duty's `cases` from the rows (SI); a value that cannot be read is left to the server's 400. */
function casesOf(rows: CaseRow[], sink: 'coolant' | 'wall'): OperatingCase[] {
  const si = (q: Quantity) => (q.value === null ? undefined : quantityToSI(q));
  // a flow fills the field its unit names (mass, volume or normal/standard volume; issue 12)
  const flow = (q: Quantity) => (q.value === null ? {} : flowFields(q.value, q.unit));
  return rows.map((r) => {
    const boundary = sink === 'coolant' ? { inletTemp_C: si(r.coolantInletTemp), ...flow(r.coolantFlow) } : {};
    const process = flow(r.processFlow);
    const defined = (o: object) => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined));
    const b = defined(boundary);
    const p = defined(process);
    return { name: r.name.trim(), ...(Object.keys(b).length ? { boundary: b } : {}), ...(Object.keys(p).length ? { process: p } : {}) };
  });
}

export function useQuoteRequest() {
  const duty = useSizingForm();
  const cases = ref<CaseRow[]>([]);
  const details = reactive({ quantity: 1 as number | null, needBy: null as string | null, reference: '', notes: '' });
  const checks = useZodForm(detailsSchema, details);
  const uploads = useQuoteUploads();
  const busy = ref(false);
  const failure = ref<string | null>(null);
  const explanation = ref<Explanation | null>(null);
  /** set once the server has stored the request: it must not be sent twice */
  const created = ref<QuoteDetail | null>(null);
  /** whether the design picked on the sizing page was stored, or why another was (issue 12) */
  const designChoice = ref<DesignChoice | null>(null);
  const idempotencyKey = newIdempotencyKey();

  function applyError(error: ApiError): void {
    const { duty: dutyFields, details: detailFields } = splitFields(error.fields);
    if (error.status === 422) {
      const field = Object.keys(dutyFields)[0];
      explanation.value = { code: error.code, message: error.message, field };
      if (field) duty.applyServerError(new ApiError(422, error.code, error.message, { [field]: error.message }));
      return;
    }
    duty.applyServerError(new ApiError(error.status, error.code, error.message, dutyFields));
    checks.applyServerError(new ApiError(error.status, error.code, error.message, detailFields));
    failure.value = error.status === 400 ? 'The server did not accept some fields: see the messages under them.' : error.message;
  }

  /** Sends the request (with the design picked, if any), then the files; the stored quote, or null when nothing was stored. */
  async function submit(chosen?: ChosenDesign | null): Promise<QuoteDetail | null> {
    if (created.value) return created.value;
    failure.value = null;
    explanation.value = null;
    const dutyInput = duty.validate();
    const rest = checks.validate();
    if (!dutyInput || !rest) {
      failure.value = 'Some fields need attention: see the messages under them.';
      return null;
    }
    busy.value = true;
    try {
      let withCases = dutyInput;
      try {
        if (cases.value.length) withCases = { ...dutyInput, cases: casesOf(cases.value, duty.model.sink) };
      } catch {
        failure.value = 'An operating case has a value that cannot be read: check its fields.';
        return null;
      }
      const answer: QuoteDetail & { designChoice?: DesignChoice } = await createQuote({ ...rest, duty: withCases, ...(chosen ? { chosenDesign: chosen } : {}) }, idempotencyKey);
      designChoice.value = answer.designChoice ?? null;
      created.value = answer;
    } catch (error) {
      if (isApiError(error)) applyError(error);
      else failure.value = errorMessage(error);
      return null;
    } finally {
      busy.value = false;
    }
    await uploads.uploadAll(created.value.id);
    return created.value;
  }

  return { duty, cases, details, checks, uploads, busy, failure, explanation, created, designChoice, submit };
}

export type QuoteRequest = ReturnType<typeof useQuoteRequest>;
