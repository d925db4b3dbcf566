import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { BagsService } from './bags-service';

const splitBody = z.object({
  maxPieces: z.number().int('The most pieces per bag is a whole number.').min(1, 'A bag holds at least 1 piece.').max(500, 'A bag holds at most 500 pieces.').optional(),
});
const tokenParams = z.object({ token: z.string().max(100) });

/** POST /api/jobs/:id/bags and GET /api/bags/by-token/:token (mounted at /api). */
export function bagsRouter(db: Db): Router {
  const router = Router();
  const bags = new BagsService(db);

  router.post('/jobs/:id/bags', allowRoles('owner', 'lead'), async (req, res) => {
    const { id } = validate(idParams('job'), req.params, 'job address');
    const { maxPieces } = validate(splitBody, req.body ?? {}, 'bag split');
    res.status(201).json(await bags.split(id, maxPieces));
  });

  router.get('/bags/by-token/:token', allowRoles('owner', 'lead', 'operator'), async (req, res) => {
    const { token } = validate(tokenParams, req.params, 'bag address');
    res.json(await bags.ticket(token));
  });

  return router;
}
