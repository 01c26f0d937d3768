import type { RateRequest, RateResult, SizeRequest, SizeResult } from '../../../shared/schemas/thermal';
import { rateParsed } from '../../../shared/thermal/rate';
import { sizeParsed, type SizeOptions } from '../../../shared/thermal/size';
import { unprocessable } from '../../lib/errors';

/**
 * The server is the authority on thermal results: the same engine the client previews with, plus a
 * last guard that no non-finite number ever leaves in a result (the engine refuses impossible duties
 * itself; this catches a gap in it and says so instead of sending NaN). These run inside the thermal
 * worker threads (server/lib/thermal-worker.ts); request handlers call the pool, never these directly.
 */
export function rateDesign(request: RateRequest): RateResult {
  return assertFinite(rateParsed(request), 'rating');
}

export function sizeCooler(request: SizeRequest, options: SizeOptions = {}): SizeResult {
  return assertFinite(sizeParsed(request, options), 'sizing');
}

function assertFinite<T>(result: T, what: string): T {
  const bad = firstNonFinite(result, '');
  if (bad !== undefined) {
    console.error(`[thermal] non-finite ${bad} in a ${what} result`);
    throw unprocessable(
      `The ${what} could not be computed reliably for this duty (${bad} came out undefined). ` +
        'Check that flows, temperatures and limits are realistic; if they are, tell us, this is a gap in the engine.',
      'not-computable',
    );
  }
  return result;
}

function firstNonFinite(value: unknown, path: string): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : path || '(value)';
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const bad = firstNonFinite(value[i], `${path}[${i}]`);
      if (bad) return bad;
    }
  } else if (value && typeof value === 'object') {
    for (const [key, v] of Object.entries(value)) {
      const bad = firstNonFinite(v, path ? `${path}.${key}` : key);
      if (bad) return bad;
    }
  }
  return undefined;
}
