/**
 * An order goes to the shop only when the shop can build it (issue 12): its design has no hard
 * finding (shared/thermal/checks/hard-findings.ts) and its build sheet, drilling pattern included,
 * can be produced. Otherwise the release is refused with the reason, and nothing moves.
 */
import type { SessionUser } from '../../../shared/schemas/auth';
import { hardFindings, hardFindingsMessage } from '../../../shared/thermal/checks/hard-findings';
import { HttpError, unprocessable } from '../../lib/errors';
import { buildSheet } from './build-sheet';
import type { OrderDeps } from './deps';
import { getOrder } from './service';

const REFUSED = 'This order cannot be released to the shop:';

export async function assertReleasable(deps: OrderDeps, user: SessionUser, id: string): Promise<void> {
  const order = await getOrder(deps, user, id);
  const found = hardFindings(order.design);
  if (found.length) throw unprocessable(`${REFUSED} ${hardFindingsMessage(found)} Ask the customer for a change to the quote.`, 'not-buildable');
  try {
    await buildSheet(deps, user, id);
  } catch (err) {
    if (err instanceof HttpError && err.status === 422) throw unprocessable(`${REFUSED} its build sheet cannot be produced. ${err.message}`, 'not-buildable');
    throw err;
  }
}
