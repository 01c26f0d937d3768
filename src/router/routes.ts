import type { RouteRecordRaw } from 'vue-router';
import type { Role } from '@shared/schemas/auth';
import { staffToOrderWorkspace } from '../views/orders/staff-redirect';
import { staffToWorkspace } from '../views/quotes/staff-redirect';

declare module 'vue-router' {
  interface RouteMeta {
    /** Reachable without a session. */
    public?: boolean;
    /** A signed-in user is sent home instead (sign-in, register). */
    guestOnly?: boolean;
    /** Only these roles may open the page; others are sent home with a notice. */
    roles?: readonly Role[];
    /** Shown in the browser tab. */
    title?: string;
    /** Present when the page belongs in the main navigation. */
    nav?: { label: string; order: number };
  }
}

const authPage = () => import('../views/auth/index.vue');

export const routes: RouteRecordRaw[] = [
  // The four account pages share one page (views/auth) that shows the form named by the route.
  ...(
    [
      ['/sign-in', 'sign-in', 'Sign in', true],
      ['/register', 'register', 'Create an account', true],
      ['/register/confirm', 'register-confirm', 'Create an account', true],
      ['/reset-password', 'reset-password', 'Reset your password', false],
      ['/reset-password/confirm', 'reset-password-confirm', 'Choose a new password', false],
    ] as const
  ).map(([path, name, title, guestOnly]) => ({
    path,
    name,
    component: authPage,
    meta: { public: true, guestOnly, title },
  })),
  {
    path: '/',
    component: () => import('../components/app-shell.vue'),
    children: [
      {
        path: '',
        name: 'home',
        component: () => import('../views/home/index.vue'),
        meta: { title: 'Home', nav: { label: 'Home', order: 0 } },
      },
      {
        // Public: anyone may size a cooler; every role sees it in the menu.
        path: 'size',
        name: 'sizing',
        component: () => import('../views/sizing/index.vue'),
        meta: { public: true, title: 'Size a cooler', nav: { label: 'Size a cooler', order: 10 } },
      },
      // The customer's quotes. `/quotes/:id` is also where e-mails link; staff are sent to their workspace.
      {
        path: 'quotes/new',
        name: 'quote-new',
        component: () => import('../views/quotes/new/index.vue'),
        meta: { title: 'New request', roles: ['customer'], nav: { label: 'New request', order: 20 } },
      },
      {
        path: 'quotes',
        name: 'quotes',
        component: () => import('../views/quotes/list/index.vue'),
        meta: { title: 'My quotes', roles: ['customer'], nav: { label: 'My quotes', order: 25 } },
      },
      {
        path: 'quotes/:id',
        name: 'quote',
        component: () => import('../views/quotes/detail/index.vue'),
        beforeEnter: staffToWorkspace,
        meta: { title: 'Quote' },
      },
      // The customer's orders. `/orders/:id` is where order e-mails link; staff go to their order page.
      {
        path: 'orders',
        name: 'orders',
        component: () => import('../views/orders/list/index.vue'),
        meta: { title: 'My orders', roles: ['customer'], nav: { label: 'My orders', order: 27 } },
      },
      {
        path: 'orders/:id',
        name: 'order',
        component: () => import('../views/orders/detail/index.vue'),
        beforeEnter: staffToOrderWorkspace,
        meta: { title: 'Order' },
      },
      {
        path: 'review',
        name: 'review-queue',
        component: () => import('../views/review/queue/index.vue'),
        meta: { title: 'Review queue', roles: ['sales', 'admin'], nav: { label: 'Review queue', order: 30 } },
      },
      {
        path: 'review/:id',
        name: 'quote-workspace',
        component: () => import('../views/review/workspace/index.vue'),
        meta: { title: 'Quote review', roles: ['sales', 'admin'] },
      },
      {
        path: 'staff/orders',
        name: 'staff-orders',
        component: () => import('../views/orders-staff/list/index.vue'),
        meta: { title: 'Orders', roles: ['sales', 'admin'], nav: { label: 'Orders', order: 40 } },
      },
      {
        path: 'staff/orders/:id',
        name: 'staff-order',
        component: () => import('../views/orders-staff/detail/index.vue'),
        meta: { title: 'Order', roles: ['sales', 'admin'] },
      },
      {
        path: 'shop',
        name: 'shop-board',
        component: () => import('../views/shop/board/index.vue'),
        meta: { title: 'Shop board', roles: ['shop', 'admin'], nav: { label: 'Shop board', order: 50 } },
      },
      {
        path: 'shop/orders/:id/build-sheet',
        name: 'build-sheet',
        component: () => import('../views/shop/build-sheet/index.vue'),
        meta: { title: 'Build sheet', roles: ['shop', 'sales', 'admin'] },
      },
      {
        path: 'admin/price-book',
        name: 'admin-price-book',
        component: () => import('../views/admin/price-book/index.vue'),
        meta: { title: 'Price book', roles: ['admin'], nav: { label: 'Price book', order: 85 } },
      },
      {
        path: 'admin/invitations',
        name: 'admin-invitations',
        component: () => import('../views/admin/invitations/index.vue'),
        meta: { title: 'Invitations', roles: ['admin'], nav: { label: 'Invitations', order: 80 } },
      },
      {
        path: 'admin/mail',
        name: 'admin-mail-log',
        component: () => import('../views/admin/mail-log/index.vue'),
        meta: { title: 'Mail log', roles: ['admin'], nav: { label: 'Mail log', order: 88 } },
      },
      {
        path: 'admin/outbox',
        name: 'admin-outbox',
        component: () => import('../views/admin/outbox/index.vue'),
        meta: { title: 'Outbox', roles: ['admin'], nav: { label: 'Outbox', order: 90 } },
      },
    ],
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('../views/not-found/index.vue'),
    meta: { public: true, title: 'Page not found' },
  },
];
