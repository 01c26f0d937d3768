import type { Role } from '@shared/schemas/auth';
import { routes } from './routes';

export interface NavItem {
  name: string;
  label: string;
}

/** The main navigation for a role, read from the route table so a page and its menu entry agree. */
/** Menu entries for a role; an anonymous visitor (no role) sees only the public pages. */
export function navItemsFor(role: Role | undefined): NavItem[] {
  const items: Array<NavItem & { order: number }> = [];
  for (const parent of routes) {
    for (const route of parent.children ?? []) {
      const nav = route.meta?.nav;
      if (!nav || typeof route.name !== 'string') continue;
      if (role === undefined && !route.meta?.public) continue;
      if (role !== undefined && route.meta?.roles && !route.meta.roles.includes(role)) continue;
      items.push({ name: route.name, label: nav.label, order: nav.order });
    }
  }
  return items.sort((a, b) => a.order - b.order).map(({ name, label }) => ({ name, label }));
}
