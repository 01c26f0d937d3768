import type { Role } from '@shared/schemas/auth';

/** A job a role does here: either a page that exists now (`route`) or one still being built. */
export interface RoleTask {
  title: string;
  text: string;
  route?: string;
}

export interface RoleGuide {
  heading: string;
  summary: string;
  now: RoleTask[];
  coming: RoleTask[];
}

// What each role does in Bundlesmith. Only tasks with a route link anywhere; the rest is told as text.
export const roleGuides: Record<Role, RoleGuide> = {
  customer: {
    heading: 'Order coolers sized to your duty',
    summary:
      'You state what has to be cooled; the fabricator sizes the bundle, prices it and stands behind the offer. ' +
      'Quotes and orders of your organisation are visible to your colleagues there and to the fabricator only.',
    now: [
      {
        title: 'New request',
        text:
          'Describe the duty — hot fluid (compressed air, hydraulic or lube oil, glycol, process liquid), flow, ' +
          'inlet and target outlet temperature, and the coolant you have — attach your datasheet or drawing, and ' +
          'get a sized, priced budget offer at once.',
        route: 'quote-new',
      },
      {
        title: 'My quotes',
        text:
          'Follow each request through the engineers’ review, answer their questions, ask for changes and ' +
          'download approved offers as PDF.',
        route: 'quotes',
      },
      {
        title: 'My orders',
        text:
          'Accept an approved offer with your PO number and pay the deposit by card; then follow each order ' +
          'through the shop, step by step, up to shipment.',
        route: 'orders',
      },
    ],
    coming: [
      {
        title: 'Compare options',
        text: 'Compare the design options of a request side by side.',
      },
    ],
  },
  sales: {
    heading: 'Review and approve offers',
    summary:
      'Customers’ requests arrive already sized and priced from the price book. You check the engineering, ' +
      'adjust where judgement is needed, and send the offer under the company’s name.',
    now: [
      {
        title: 'Review queue',
        text: 'Every request with its auto-sized design and price, how long it has waited against the response target, and who has it.',
        route: 'review-queue',
      },
      {
        title: 'Orders',
        text: 'Paid orders with their steps and who moved them: release a paid order to the shop, cancel with a refund before fabrication, open its build sheet.',
        route: 'staff-orders',
      },
      {
        title: 'Correct, revise and approve',
        text:
          'Open a quote from the queue: change the duty or the geometry and see it re-rated at once, override price lines ' +
          'with a stated reason, keep internal notes, then approve and send the offer, ask questions or decline.',
      },
    ],
    coming: [
      {
        title: 'Revise on request',
        text: 'Pick up a customer’s change request and send a revised offer that keeps the old one intact.',
      },
    ],
  },
  shop: {
    heading: 'Build from the sheet',
    summary:
      'Every accepted order becomes a build sheet derived from the approved design, so what is drilled is what was ' +
      'sold.',
    now: [
      {
        title: 'Shop board',
        text:
          'Released orders by step, soonest need-by first: move each on as its step is done (a move that e-mails the ' +
          'customer asks first; the hydrotest is recorded side by side against the build sheet\'s pressures), hold with a ' +
          'reason and a wording for the customer, and resume, so sales and the customer see where it stands.',
        route: 'shop-board',
      },
      {
        title: 'Build sheets',
        text:
          'From each card on the board: bill of materials, cut list, the tubesheet drilling pattern to scale, ' +
          'hydrotest pressure and inspection points, with the PDF and the drilling CSV.',
      },
    ],
    coming: [],
  },
  admin: {
    heading: 'Keep the house in order',
    summary: 'You decide who works here and with which role, and keep the figures every quote is priced from.',
    now: [
      {
        title: 'Invitations',
        text: 'Invite sales engineers, shop staff, other administrators or customers by e-mail.',
        route: 'admin-invitations',
      },
      {
        title: 'Outbox',
        text: 'Read every e-mail the application has sent — invitations, password resets — as caught by the local mail sink.',
        route: 'admin-outbox',
      },
      {
        title: 'Price book',
        text: 'Material, tube, labour and overhead rates, margins, deposit and lead time that feed every automatic quote; each save is a new version.',
        route: 'admin-price-book',
      },
      {
        title: 'Review queue',
        text: 'Every customer request and where it stands; you can review and approve like a sales engineer.',
        route: 'review-queue',
      },
      {
        title: 'Orders',
        text: 'Every order and its timeline; you may cancel at any step before shipment.',
        route: 'staff-orders',
      },
      {
        title: 'Shop board',
        text: 'The released orders by step, as the shop sees them.',
        route: 'shop-board',
      },
    ],
    coming: [
      {
        title: 'Materials and fluids',
        text: 'The tube and shell materials and the fluid library the sizing draws on, each with its source.',
      },
      {
        title: 'Users and deposit rules',
        text: 'Change roles, switch off accounts, and set how much deposit an order needs.',
      },
    ],
  },
};
