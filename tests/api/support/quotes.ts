/** Invented duties and helpers for the quote API tests. */
import type { Agent } from 'supertest';

/** A hydraulic-oil cooler for a power unit (invented): ISO VG 46 cooled by plant water. */
export const oilCoolerDuty = () => ({
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});

export async function createQuote(agent: Agent, overrides: Record<string, unknown> = {}) {
  const res = await agent.post('/api/quotes').send({ duty: oilCoolerDuty(), quantity: 2, reference: 'HPU-7 return line', ...overrides });
  if (res.status !== 201) throw new Error(`quote not created: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as { id: string; number: string; version: number; status: string; priceTotal_minor: number; revision: { design: Record<string, unknown>; price: { lines: { key: string; amount_minor: number; group: string; override?: { computed_minor: number; reason: string } }[] } } };
}

/** The smallest valid PNG (1×1 px, transparent). */
export const TINY_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);
