/**
 * The hydrotest, side by side: the shop records each side's test (pressure held, hold time, passed or
 * failed; who and when are the event's), a pass below the side's required pressure is refused, and
 * the order leaves the hydrotest only when the latest test of both sides passed. The required
 * pressures are the build sheet's: shared/thermal/checks/walls.ts `hydrotest` over the accepted
 * revision's design and duty, rounded to the pascal as build-sheet.ts does.
 */
import type { SessionUser } from '../../../shared/schemas/auth';
import { hydrotestSides, type HydrotestSideName, type HydrotestState, type recordHydrotestSchema } from '../../../shared/schemas/orders';
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import { hydrotest, wallSides } from '../../../shared/thermal/checks/walls';
import { badRequest, HttpError } from '../../lib/errors';
import type { Executor } from '../../lib/sql-adapter';
import { processSideOf } from '../pricing/design-fields';
import * as quoteRepo from '../quotes/repository';
import type { OrderDeps } from './deps';
import * as repo from './repository';
import { loadOrder } from './service';

export const SIDE_NAME: Record<HydrotestSideName, string> = { tube: 'Tube side', shell: 'Shell side' };
export const barg = (pa: number) => `${(pa / 1e5).toFixed(1)} bar(g)`;

/** Each side's test pressure, Pa gauge, as the build sheet states it. */
export function requiredTestPressures(design: Design, duty: SizeRequest): Record<HydrotestSideName, number> {
  const test = hydrotest(design, wallSides(duty, processSideOf(design)));
  return { tube: Math.round(test.tube.test_Pa), shell: Math.round(test.shell.test_Pa) };
}

type SideRecord = { side: HydrotestSideName; pressure_Pa: number; holdTime_min: number; passed: boolean; required_Pa: number };

/** The customer's line (pressure and result) and the staff's detail of one side's test. */
export const hydrotestLine = (r: Pick<SideRecord, 'side' | 'pressure_Pa' | 'passed'>) =>
  `${SIDE_NAME[r.side]} tested at ${barg(r.pressure_Pa)}: ${r.passed ? 'passed' : 'failed'}.`;
export const hydrotestDetail = (data: unknown): string | undefined => {
  const r = data as Partial<SideRecord> | null;
  if (!r || typeof r.holdTime_min !== 'number' || typeof r.required_Pa !== 'number') return undefined;
  return `Held ${r.holdTime_min} min; required ${barg(r.required_Pa)}.`;
};

async function required(deps: OrderDeps, order: { quoteId: string; revisionNumber: number }) {
  const revision = (await quoteRepo.findRevision(deps.db, order.quoteId, order.revisionNumber))!;
  return requiredTestPressures(revision.data.design, revision.data.duty);
}

/** Each side's latest test and required pressure; `passed` when both latest tests passed. */
export async function hydrotestState(deps: OrderDeps, db: Executor, order: { id: string; quoteId: string; revisionNumber: number }): Promise<HydrotestState> {
  const need = await required(deps, order);
  const events = await repo.timeline(db, order.id);
  const sides = hydrotestSides.map((side) => {
    const last = events.filter((e) => (e.kind === 'hydrotest-passed' || e.kind === 'hydrotest-failed') && (e.data as SideRecord | null)?.side === side).at(-1);
    const r = last?.data as SideRecord | undefined;
    return {
      side,
      required_Pa: need[side],
      latest: last && r ? { pressure_Pa: r.pressure_Pa, holdTime_min: r.holdTime_min, passed: last.kind === 'hydrotest-passed', by: last.by, at: new Date(last.at).toISOString() } : null,
    };
  });
  return { sides, passed: sides.every((s) => s.latest?.passed) };
}

export async function getHydrotest(deps: OrderDeps, user: SessionUser, id: string): Promise<HydrotestState> {
  return hydrotestState(deps, deps.db, await loadOrder(deps, user, id));
}

type RecordInput = ReturnType<typeof recordHydrotestSchema.parse>;

/**
 * Records the tested sides in one transaction (a refused side stores nothing of either). A pass
 * below the side's required pressure is a 400 naming `<side>.pressure_Pa`. A failed side is kept
 * (staff see it; the customer does not) and keeps the order at the hydrotest.
 */
export async function recordHydrotest(deps: OrderDeps, user: SessionUser, id: string, input: RecordInput): Promise<HydrotestState> {
  const order = await loadOrder(deps, user, id);
  if (order.status !== 'hydrotest') throw new HttpError(409, 'wrong-status', `The hydrotest is recorded while the order is at the hydrotest; this one is ${order.status}.`);
  const need = await required(deps, order);
  const fields: Record<string, string> = {};
  for (const side of hydrotestSides) {
    const t = input[side];
    if (t?.passed && t.pressure_Pa < need[side]) {
      fields[`${side}.pressure_Pa`] = `${barg(t.pressure_Pa)} is below the ${SIDE_NAME[side].toLowerCase()}'s test pressure of ${barg(need[side])}: a pass needs at least that.`;
    }
  }
  if (Object.keys(fields).length) throw badRequest(Object.values(fields).join(' '), fields);
  await deps.db.transaction(async (tx) => {
    // the order's row locked: a move off the hydrotest either waits for this record or has happened already
    if ((await repo.lockOrderStatus(tx, id)) !== 'hydrotest') throw new HttpError(409, 'stale-status', 'The order moved on meanwhile; reload it.');
    for (const side of hydrotestSides) {
      const t = input[side];
      if (!t) continue;
      const data: SideRecord = { side, pressure_Pa: Math.round(t.pressure_Pa), holdTime_min: t.holdTime_min, passed: t.passed, required_Pa: need[side] };
      await repo.addEvent(tx, id, user.id, 'hydrotest', hydrotestLine(data), data, t.passed ? 'hydrotest-passed' : 'hydrotest-failed');
    }
    if (input.note) await repo.addEvent(tx, id, user.id, 'hydrotest', input.note, null, 'note');
  });
  return hydrotestState(deps, deps.db, order);
}
