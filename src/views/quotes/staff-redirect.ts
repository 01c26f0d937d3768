/**
 * `/quotes/:id` is the address e-mails link to. Staff have their own workspace for a quote
 * (`quote-workspace`, the sales pages): send them there when that route exists and their role may
 * open it; everyone else (customers, and staff without a workspace) stays on the customer's page.
 */
import { useRouter, type RouteLocationNormalized, type RouteLocationRaw } from 'vue-router';
import { useSessionStore } from '../../stores/session';

const WORKSPACE = 'quote-workspace';

export function staffToWorkspace(to: RouteLocationNormalized): true | RouteLocationRaw {
  const role = useSessionStore().user?.role;
  if (!role || role === 'customer') return true;
  // vue-router runs guards inside the app's context, so the router can be injected here.
  const router = useRouter();
  if (!router.hasRoute(WORKSPACE)) return true;
  const target = { name: WORKSPACE, params: { id: String(to.params.id) } };
  const allowed = router.resolve(target).meta.roles;
  return !allowed || allowed.includes(role) ? { ...target, replace: true } : true;
}
