import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import { hashDeviceToken, newDeviceToken } from '../auth/secrets';
import type { Db } from '../db/tables';
import { notFound } from '../http/http-error';
import { idParams, validate } from '../http/validate';
import { DisplaysRepository } from './displays-repository';

const createBody = z.object({ name: z.string().trim().min(1, 'Give the display a name, e.g. "Wall by the presses".').max(80) });
const displayParams = idParams('display');

/** /api/displays: wall screens that may read the floor board, each with its own revocable token. */
export function displaysRouter(db: Db): Router {
  const router = Router();
  const displays = new DisplaysRepository(db);
  const leads = allowRoles('owner', 'lead');

  router.get('/', leads, async (_req, res) => {
    const rows = await displays.listActive();
    res.json(rows.map((row) => ({ id: row.id, name: row.name, createdAt: row.created_at.toISOString() })));
  });

  router.post('/', leads, async (req, res) => {
    const { name } = validate(createBody, req.body, 'new display');
    const deviceToken = newDeviceToken();
    const id = await displays.create(name, hashDeviceToken(deviceToken), req.principal!.userId);
    res.status(201).json({ id, name, deviceToken });
  });

  router.delete('/:id', leads, async (req, res) => {
    const { id } = validate(displayParams, req.params, 'display address');
    if (!(await displays.revoke(id))) throw notFound(`There is no active display ${id}.`);
    res.status(204).end();
  });

  return router;
}
