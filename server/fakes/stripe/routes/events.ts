import { Router } from 'express';
import { z } from 'zod';
import { noSuch } from '../errors';
import { integer, parseParams } from '../params';
import type { StripeFakeState } from '../state';

const listParams = z
  .object({
    type: z.string().optional(),
    /** Stripe's limit: 1 to 100, default 10 */
    limit: integer(1, 100).optional(),
    starting_after: z.string().optional(),
  })
  .strict();

/** `type` matches exactly or with Stripe's `*` wildcard (`payment_intent.*`). */
const matcher = (type: string | undefined) => {
  if (!type) return () => true;
  const re = new RegExp(`^${type.split('*').map((s) => s.replace(/[.+?^${}()|[\]\\]/g, '\\$&')).join('.*')}$`);
  return (t: string) => re.test(t);
};

/** The event log, newest first, paged as Stripe's lists are (`has_more`, `starting_after`). */
export function eventRoutes(state: StripeFakeState) {
  const router = Router();

  router.get('/events', (req, res) => {
    const { type, limit = 10, starting_after } = parseParams(listParams, req.query);
    const matches = matcher(type);
    let newestFirst = [...state.events].reverse().filter((e) => matches(e.type));
    if (starting_after) {
      const at = newestFirst.findIndex((e) => e.id === starting_after);
      newestFirst = at === -1 ? [] : newestFirst.slice(at + 1);
    }
    res.json({ object: 'list', data: newestFirst.slice(0, limit), has_more: newestFirst.length > limit, url: '/v1/events' });
  });

  router.get('/events/:id', (req, res) => {
    const event = state.events.find((e) => e.id === req.params.id);
    if (!event) throw noSuch('event', req.params.id);
    res.json(event);
  });

  return router;
}
