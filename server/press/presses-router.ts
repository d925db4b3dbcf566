import { Router } from 'express';
import type { PressListItem } from '../../src/shared/press/press-contract';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { PressRepository } from './press-repository';

/** /api/presses: the shop's presses, for choosing one on the Press card. */
export function pressesRouter(db: Db): Router {
  const router = Router();
  const presses = new PressRepository(db);

  router.get('/', allowRoles('owner', 'lead', 'operator'), async (_req, res) => {
    const list: PressListItem[] = await presses.listPresses();
    res.json(list);
  });

  return router;
}
