import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { SpoilReasonsService } from './spoil-reasons-service';

const label = z.string().trim().min(1, 'A spoil reason needs a label.').max(80, 'A spoil reason label is at most 80 characters.');
const position = z.number().int('The position is a whole number.').min(0, 'The position is 0 or more.').max(65535, 'The position is at most 65535.');
const active = z.boolean({ error: 'active is true or false.' });

const createBody = z.object({ label, position: position.optional(), active: active.optional() });
const updateBody = z
  .object({ label: label.optional(), position: position.optional(), active: active.optional() })
  .refine((body) => Object.values(body).some((value) => value !== undefined), 'Send a new label, position or active to change.');

/** /api/spoil-reasons: the list stations pick from, edited by the owner and lead (rename, reorder, deactivate; never delete). */
export function spoilReasonsRouter(db: Db): Router {
  const router = Router();
  const reasons = new SpoilReasonsService(db);
  const editors = allowRoles('owner', 'lead');

  router.get('/', allowRoles('owner', 'lead', 'operator'), async (_req, res) => {
    res.json(await reasons.list());
  });

  router.post('/', editors, async (req, res) => {
    res.status(201).json(await reasons.create(validate(createBody, req.body ?? {}, 'spoil reason')));
  });

  router.put('/:id', editors, async (req, res) => {
    const { id } = validate(idParams('spoil reason'), req.params, 'spoil reason address');
    res.json(await reasons.update(id, validate(updateBody, req.body ?? {}, 'spoil reason')));
  });

  return router;
}
