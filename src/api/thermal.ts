/**
 * The public thermal API (no sign-in): size a duty, rate a design, list the fluid library.
 * Bodies and results are SI, shaped by the shared schemas in `@shared/schemas/thermal`.
 */
import type { RateRequestInput, RateResult, SizeRequestInput, SizeResult } from '@shared/schemas/thermal';
import type { FluidInfo } from '@shared/thermal/fluids/types';
import { request } from './http';

export type { FluidInfo };

/** `POST /api/thermal/size`: the recommended design and the feasible alternatives. */
export function sizeCooler(input: SizeRequestInput): Promise<SizeResult> {
  return request<SizeResult>('/thermal/size', { method: 'POST', body: input, quietUnauthorized: true });
}

/** `POST /api/thermal/rate`: outlet temperatures, duty and pressure drops of a given geometry. */
export function rateDesign(input: RateRequestInput): Promise<RateResult> {
  return request<RateResult>('/thermal/rate', { method: 'POST', body: input, quietUnauthorized: true });
}

/** `GET /api/fluids`: the fluid library with each fluid's valid temperature range and data source. */
export async function fetchFluids(): Promise<FluidInfo[]> {
  const reply = await request<{ items: FluidInfo[] }>('/fluids', { quietUnauthorized: true });
  return reply.items;
}
