import { Router } from 'express';
import { listMailQuerySchema, mailIdParamsSchema } from '../../../shared/schemas/mail-log';
import { requireRole } from '../../lib/auth/guards';
import { parse } from '../../lib/validate';
import * as service from './service';

/** Admin-only: the mail log (`/api/admin/mail`), its messages and a resend. */
export function mailLogRouter(deps: service.MailLogDeps): Router {
  const r = Router();
  r.use(requireRole('admin'));
  r.get('/', async (req, res) => {
    res.json(await service.listMail(deps, parse(listMailQuerySchema, req.query, 'query')));
  });
  r.get('/:id', async (req, res) => {
    const { id } = parse(mailIdParamsSchema, req.params, 'path');
    res.json(await service.getMail(deps, id));
  });
  r.post('/:id/resend', async (req, res) => {
    const { id } = parse(mailIdParamsSchema, req.params, 'path');
    res.status(201).json(await service.resendMail(deps, id));
  });
  return r;
}
