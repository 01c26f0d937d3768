/**
 * A working day's queue for the demo: a dozen invented requests from the demo customers, sized and
 * priced by the real services, in varied states and ages. Each request is keyed by its reference:
 * one already there is skipped, so a re-run (or a run after a failure) adds only what is missing.
 */
import { eq, sql } from 'drizzle-orm';
import type { SessionUser } from '../shared/schemas/auth';
import { createQuoteSchema } from '../shared/schemas/quotes';
import { loadConfig } from '../server/lib/config';
import type { QuoteDeps } from '../server/features/quotes/deps';
import { findSessionUser } from '../server/features/auth/repository';
import { patchQuote } from '../server/features/quotes/edit';
import { createQuote } from '../server/features/quotes/service';
import { approve, assign, decline, sendBack } from '../server/features/quotes/workflow';
import { discardMailer } from '../server/lib/mail';
import { localStorage } from '../server/lib/storage';
import type { Db } from './index';
import { quotes, users } from './schema';

const water = (flow: number, inlet: number) => ({ kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: flow, inletTemp_C: inlet });
const limits = (len: number, dp: number) => ({ maxTubeLength_m: len, maxPressureDrop_Pa: dp, maxShellPressureDrop_Pa: 70000 });
const airIntake = { temp_C: 30, relativeHumidity: 0.6, pressure_Pa: 100000 };

type Step = 'in-review' | 'assigned' | 'edited' | 'questions' | 'approved' | 'declined';
const REQUESTS: { by: string; hoursAgo: number; step: Step; reference: string; quantity: number; needBy?: string; duty: unknown; note?: string }[] = [
  { by: 'customer@pellmar.example', hoursAgo: 3, step: 'in-review', reference: 'SC-90 aftercooler', quantity: 4, duty: { process: { fluid: 'air-moist', intake: airIntake, pressure_Pa: 901325, massFlow_kg_s: 0.3, inletTemp_C: 140, outletTemp_C: 38 }, boundary: water(1.2, 28), constraints: limits(2.5, 25000) } },
  { by: 'customer@pellmar.example', hoursAgo: 30, step: 'assigned', reference: 'SC-45 aftercooler', quantity: 10, duty: { process: { fluid: 'air-moist', intake: airIntake, pressure_Pa: 901325, massFlow_kg_s: 0.15, inletTemp_C: 130, outletTemp_C: 40 }, boundary: water(0.6, 28), constraints: limits(2, 25000) } },
  { by: 'customer@pellmar.example', hoursAgo: 55, step: 'questions', reference: 'Two-stage intercooler', quantity: 2, note: 'Is the second stage at 3 bar(g)?', duty: { process: { fluid: 'air', pressure_Pa: 401325, massFlow_kg_s: 0.45, inletTemp_C: 120, outletTemp_C: 45 }, boundary: water(1.5, 27), constraints: limits(3, 20000) } },
  { by: 'customer@pellmar.example', hoursAgo: 120, step: 'approved', reference: 'SC-90 aftercooler, coastal', quantity: 2, duty: { process: { fluid: 'air-moist', intake: airIntake, pressure_Pa: 901325, massFlow_kg_s: 0.25, inletTemp_C: 135, outletTemp_C: 38 }, boundary: water(1.0, 26), constraints: limits(2.5, 25000) } },
  { by: 'buyer@quarryhill.example', hoursAgo: 1, step: 'in-review', reference: 'HPU-7 return line', quantity: 6, needBy: '2027-02-15', duty: { process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 }, boundary: water(2.0, 27), constraints: limits(3.5, 70000) } },
  { by: 'buyer@quarryhill.example', hoursAgo: 20, step: 'edited', reference: 'HPU-12 case drain', quantity: 3, duty: { process: { fluid: 'oil-vg68', pressure_Pa: 400000, massFlow_kg_s: 0.8, inletTemp_C: 65, outletTemp_C: 50 }, boundary: { ...water(1.6, 30), fluid: 'ethylene-glycol-30' }, constraints: limits(3, 70000) } },
  { by: 'buyer@quarryhill.example', hoursAgo: 70, step: 'approved', reference: 'Press line cooler', quantity: 1, duty: { process: { fluid: 'oil-vg32', pressure_Pa: 600000, massFlow_kg_s: 2.0, inletTemp_C: 58, outletTemp_C: 45 }, boundary: water(3.0, 25), constraints: limits(4, 70000) } },
  { by: 'buyer@quarryhill.example', hoursAgo: 200, step: 'declined', reference: 'Test stand, 400 bar', quantity: 1, note: 'Tube-side pressure beyond our shop qualification.', duty: { process: { fluid: 'oil-vg46', pressure_Pa: 900000, massFlow_kg_s: 0.5, inletTemp_C: 70, outletTemp_C: 45 }, boundary: water(1.0, 25), constraints: limits(2, 70000) } },
  { by: 'process@ospreyvale.example', hoursAgo: 6, step: 'in-review', reference: 'Digester loop trim cooler', quantity: 1, duty: { process: { fluid: 'propylene-glycol-30', pressure_Pa: 400000, massFlow_kg_s: 4.0, inletTemp_C: 50, outletTemp_C: 38 }, boundary: water(6.0, 24), constraints: limits(4, 60000) } },
  { by: 'process@ospreyvale.example', hoursAgo: 52, step: 'assigned', reference: 'CHP jacket water', quantity: 2, duty: { process: { fluid: 'ethylene-glycol-50', pressure_Pa: 300000, massFlow_kg_s: 3.2, inletTemp_C: 85, outletTemp_C: 70 }, boundary: water(5.0, 28), constraints: limits(3, 50000) } },
  { by: 'process@ospreyvale.example', hoursAgo: 96, step: 'approved', reference: 'Sample cooler', quantity: 3, duty: { process: { fluid: 'water', pressure_Pa: 500000, massFlow_kg_s: 0.3, inletTemp_C: 95, outletTemp_C: 35 }, boundary: water(1.5, 20), constraints: limits(3, 50000) } },
  { by: 'process@ospreyvale.example', hoursAgo: 10, step: 'in-review', reference: 'Condensate return', quantity: 1, duty: { process: { fluid: 'water', pressure_Pa: 400000, massFlow_kg_s: 1.5, inletTemp_C: 90, outletTemp_C: 55 }, boundary: { kind: 'wall', wallTemp_C: 30 }, constraints: limits(3, 50000) } },
];

export async function seedQuotes(db: Db): Promise<number> {
  const existing = new Set((await db.select({ reference: quotes.reference }).from(quotes)).map((q) => q.reference));
  const missing = REQUESTS.filter((r) => !existing.has(r.reference));
  if (missing.length === 0) return 0;
  const config = loadConfig();
  const deps: QuoteDeps = { db, config, mailer: discardMailer, storage: localStorage('/nonexistent') };
  const userByEmail = async (email: string) => {
    const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
    return (await findSessionUser(db, row!.id)) as SessionUser;
  };
  const sales = await userByEmail('sales@aldercreek.example');
  for (const r of missing) {
    const customer = await userByEmail(r.by);
    const input = createQuoteSchema.parse({ duty: r.duty, quantity: r.quantity, reference: r.reference, ...(r.needBy ? { needBy: r.needBy } : {}) });
    let q = await createQuote(deps, customer, input);
    if (r.step === 'assigned') q = await assign(deps, sales, q.id, q.version);
    if (r.step === 'edited') q = await patchQuote(deps, sales, q.id, { version: q.version, internalNote: 'Asked the customer about the coolant temperature in summer.' });
    if (r.step === 'edited') q = await patchQuote(deps, sales, q.id, { version: q.version, quantity: r.quantity + 1 });
    if (r.step === 'questions') q = await sendBack(deps, sales, q.id, { version: q.version, message: r.note! });
    if (r.step === 'approved') q = await approve(deps, sales, q.id, { version: q.version });
    if (r.step === 'declined') q = await decline(deps, sales, q.id, { version: q.version, message: r.note! });
    const at = sql`now() - ${r.hoursAgo} * interval '1 hour'`;
    await db.update(quotes).set({ createdAt: at, updatedAt: sql`now() - ${r.hoursAgo / 2} * interval '1 hour'` }).where(eq(quotes.id, q.id));
  }
  return missing.length;
}
