import { Router } from 'express';
import { z } from 'zod';
import { inviteSchema } from '../../../shared/schemas/auth';
import { currentUser, requireRole, requireUser } from '../../lib/auth/guards';
import { parse } from '../../lib/validate';
import * as repo from './repository';
import * as service from './service';

const idParams = z.object({ id: z.uuid({ error: 'must be an organisation id (UUID)' }) });

export function organizationsRouter(deps: service.OrganizationDeps): Router {
  const r = Router();
  r.get('/:id', requireUser, async (req, res) => {
    const { id } = parse(idParams, req.params, 'path');
    res.json(await service.getOrganization(deps, currentUser(req), id));
  });
  return r;
}

/** Admin-only: organisations and invitations. */
export function adminRouter(deps: service.OrganizationDeps): Router {
  const r = Router();
  r.use(requireRole('admin'));
  r.get('/organizations', async (_req, res) => {
    res.json({ items: await repo.listOrganizations(deps.db) });
  });
  r.post('/invitations', async (req, res) => {
    const invitation = await service.invite(deps, currentUser(req), parse(inviteSchema, req.body));
    res.status(201).json({ invitation });
  });
  return r;
}
