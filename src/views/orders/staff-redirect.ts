/**
 * `/orders/:id` is where the buyer's e-mails link. Staff have their own order page (`staff-order`,
 * built beside these): send them there when that route exists and their role may open it.
 */
import { useRouter, type RouteLocationNormalized, type RouteLocationRaw } from 'vue-router';
import { useSessionStore } from '../../stores/session';

const STAFF_ORDER = 'staff-order';

export function staffToOrderWorkspace(to: RouteLocationNormalized): true | RouteLocationRaw {
  const role = useSessionStore().user?.role;
  if (!role || role === 'customer') return true;
  const router = useRouter();
  if (!router.hasRoute(STAFF_ORDER)) return true;
  const target = { name: STAFF_ORDER, params: { id: String(to.params.id) } };
  const allowed = router.resolve(target).meta.roles;
  return !allowed || allowed.includes(role) ? { ...target, replace: true } : true;
}
