/** Tag colours, dates and the tube summary of orders, shared by the staff order pages and the shop board. */
import { formatDate, plural } from '@shared/format';
import type { OrderStatus } from '@shared/schemas/orders';
import type { Design } from '@shared/schemas/thermal';
import { materialName, tubeLabel } from '../sizing/parts/labels';

export const ORDER_STATUS_TAG: Record<OrderStatus, 'default' | 'info' | 'success' | 'warning' | 'error'> = {
  'deposit-paid': 'warning',
  released: 'info',
  cutting: 'info',
  tubing: 'info',
  'shell-and-heads': 'info',
  hydrotest: 'info',
  'ready-to-ship': 'success',
  shipped: 'default',
  'on-hold': 'warning',
  cancelled: 'error',
};

/** "12 Mar 2026" from a date-only need-by ("2026-03-12"); "—" when none was given. */
export function formatNeedBy(needBy: string | null): string {
  return formatDate(needBy ? needBy.slice(0, 10) : null);
}

/** Past its need-by date (the whole of that day still counts as on time). */
export function isOverdue(needBy: string | null, now = new Date()): boolean {
  if (!needBy) return false;
  const end = new Date(`${needBy.slice(0, 10)}T23:59:59`);
  return !Number.isNaN(end.getTime()) && end < now;
}

/** "62 × 3/4 in OD, BWG 16 · 2.40 m · Carbon steel · 2 passes": what the shop cuts and tubes. */
export function tubeSummary(d: Design): string {
  const passes = plural(d.tubePasses, 'pass', 'passes');
  return `${d.tubeCount} × ${tubeLabel(d.tubeOuterDiameter_m, d.tubeWallLabel, 'SI')} · ${d.tubeLength_m.toFixed(2)} m · ${materialName(d.tubeMaterial)} · ${passes}`;
}
