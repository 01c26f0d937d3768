/** A sales engineer's changes to a quote under review: duty, geometry, quantity, price overrides, notes. */
import type { SessionUser } from '../../../shared/schemas/auth';
import type { FreeLine, patchQuoteSchema, Revision } from '../../../shared/schemas/quotes';
import type { Config } from '../../lib/config';
import { conflict, HttpError } from '../../lib/errors';
import type { QuoteDeps } from './deps';
import { activeBook, buildRevision, evaluateWithBook, priceWithBook, sizeWithBook, type ActiveBook } from './pricing-port';
import { assertBuildable, hardFindingsWithBook } from './buildable';
import { designSummary } from './present';
import * as repo from './repository';
import { getQuote, loadVisible } from './service';

type Patch = ReturnType<typeof patchQuoteSchema.parse>;
type Change = Omit<Patch, 'version' | 'internalNote'>;

/** What the quote would become: design re-sized (new duty) or evaluated (new geometry), re-priced. */
async function computeChange(current: Revision, quantity: number, needBy: string | null, change: Change, book: ActiveBook, by: SessionUser, config: Config) {
  const duty = change.duty ?? current.duty;
  let design = current.design;
  let alternatives = current.alternatives as Revision['design'][];
  if (change.duty) ({ design, alternatives } = await sizeWithBook(config, duty, book));
  else if (change.design) design = await evaluateWithBook(config, duty, change.design, book);
  const qty = change.quantity ?? quantity;
  const base = priceWithBook(design, book, { quantity: qty, needBy });
  const keys = new Set(base.lines.map((l) => l.key));
  // overrides given replace the old ones; otherwise the old ones carry over where their line still exists
  const overrides = change.priceOverrides
    ? change.priceOverrides.map((o) => ({ ...o, by: by.name }))
    : current.price.lines
        .filter((l) => l.override && keys.has(l.key))
        .map((l) => ({ key: l.key, amount_minor: l.amount_minor, reason: l.override!.reason, by: l.override!.by }));
  const freeLines = change.freeLines ? change.freeLines.map((l) => ({ ...l, by: by.name })) : freeLinesOf(current.price);
  const price = overrides.length || freeLines.length ? priceWithBook(design, book, { quantity: qty, needBy, overrides, freeLines }) : base;
  return { duty, design, alternatives, price, quantity: qty };
}

/** The added lines of a saved price, as they were entered (they carry over to the next revision). */
function freeLinesOf(price: Revision['price']) {
  return price.lines
    .filter((l) => l.group === 'extra' && l.added)
    .map(({ amount_minor, added }) => ({ ...added!, kind: added!.kind as FreeLine['kind'], amount_minor }));
}

function editableOrThrow(status: string) {
  if (status !== 'in-review' && status !== 'questions') {
    throw new HttpError(409, 'wrong-status', `A quote that is ${status} cannot be edited; ask the customer to request a change first.`);
  }
}

/** Saves the change as a new draft revision; 409 when `version` is not the quote's version. */
export async function patchQuote(deps: QuoteDeps, user: SessionUser, id: string, input: Patch) {
  const row = await loadVisible(deps, user, id);
  editableOrThrow(row.status);
  const stale = () => conflict('Someone changed this quote since you opened it; reload it, check their change, then try again.', 'stale-version');
  if (input.version !== row.version) throw stale();
  const { version, internalNote, ...change } = input;
  const changed = Object.values(change).some((v) => v !== undefined);
  const current = (await repo.findRevision(deps.db, id, row.currentRevision))!;
  const book = await activeBook(deps);
  const next = changed ? await computeChange(current.data, row.quantity, row.needBy, change, book, user, deps.config) : undefined;
  // a design that cannot be built as it stands is never saved (issue 12): 422 naming the hard findings
  if (next) assertBuildable(next.design, book.data, 'saved as a revision');

  await deps.db.transaction(async (tx) => {
    if (!next) {
      if (!(await repo.updateQuoteAtVersion(tx, id, version, {}))) throw stale();
    } else {
      const number = row.currentRevision + 1;
      const revision = buildRevision(number, 'draft', user, next.duty, next.design, next.alternatives, next.price, book);
      const ok = await repo.updateQuoteAtVersion(tx, id, version, {
        duty: next.duty,
        quantity: next.quantity,
        currentRevision: number,
        priceTotalMinor: next.price.total_minor,
        designSummary: designSummary(next.design, next.duty),
        assigneeId: row.assigneeId ?? user.id,
      });
      if (!ok) throw stale();
      await repo.insertRevision(tx, { quoteId: id, number, kind: 'draft', data: revision, priceBookVersion: book.version, totalMinor: next.price.total_minor, createdBy: user.id });
      const what = Object.entries(change).filter(([, v]) => v !== undefined).map(([k]) => k);
      await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'edited', message: `Changed ${what.join(', ')} (revision ${number})`, internal: true, data: { revision: number, changed: what } });
    }
    if (internalNote) await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'note', message: internalNote, internal: true });
  });
  return getQuote(deps, user, id);
}

/** The same computation, nothing stored: the workspace shows price and margin before saving. */
export async function previewChange(deps: QuoteDeps, user: SessionUser, id: string, change: Change) {
  const row = await loadVisible(deps, user, id);
  const current = (await repo.findRevision(deps.db, id, row.currentRevision))!;
  const book = await activeBook(deps);
  const next = await computeChange(current.data, row.quantity, row.needBy, change, book, user, deps.config);
  return { design: next.design, price: next.price, alternatives: next.alternatives.map(({ rating: _r, ...a }) => a), hardFindings: hardFindingsWithBook(next.design, book.data) };
}
