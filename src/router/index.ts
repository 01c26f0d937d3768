import { createRouter, createWebHistory } from 'vue-router';
import { useNoticeStore } from '../stores/notice';
import { roleLabel } from '../stores/roles';
import { useSessionStore } from '../stores/session';
import { routes } from './routes';

export const router = createRouter({
  history: createWebHistory(),
  routes,
  scrollBehavior: () => ({ top: 0 }),
});

router.beforeEach(async (to) => {
  const session = useSessionStore();
  await session.ensureLoaded();

  if (to.meta.public) {
    return to.meta.guestOnly && session.signedIn ? { name: 'home' } : true;
  }
  if (!session.user) {
    return { name: 'sign-in', query: to.fullPath === '/' ? {} : { next: to.fullPath } };
  }
  const allowed = to.meta.roles;
  if (allowed && !allowed.includes(session.user.role)) {
    const who = allowed.map((role) => roleLabel(role).toLowerCase()).join(', ');
    useNoticeStore().show('warning', `“${to.meta.title ?? to.path}” is open to ${who} only, so you were brought home.`);
    return { name: 'home' };
  }
  return true;
});

router.afterEach((to, _from, failure) => {
  if (!failure) useNoticeStore().afterNavigation();
  document.title = to.meta.title ? `${to.meta.title} · Bundlesmith` : 'Bundlesmith';
});

/** Only same-site paths may be used as the place to return to after sign-in. */
export function safeNext(next: unknown): string {
  return typeof next === 'string' && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}
