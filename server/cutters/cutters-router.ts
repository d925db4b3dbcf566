import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import type { FloorBroadcast } from '../events/floor-broadcast';
import { CutFloorEvents } from './cut-events';
import { CuttersService } from './cutters-service';

const id = (what: string) => z.number({ error: `Choose the ${what}.` }).int(`A ${what} id is a whole number.`).positive(`Choose the ${what}.`);
const testCutBody = z.object({
  cutterId: id('cutter'),
  filmTypeId: id('film type'),
  bagId: id('bag').optional(),
  steps: z
    .array(
      z.object({
        forceG: z.number({ error: 'Each force is a number of grams.' }).int('Each force is whole grams.').min(1, 'A force is at least 1 g.').max(2000, 'A force is at most 2000 g.'),
        cutClean: z.boolean({ error: 'Say whether each force cut clean.' }),
        weededClean: z.boolean({ error: 'Say whether each force weeded clean.' }),
      }),
    )
    .min(1, 'Tap the force that cut clean, or mark that none did.')
    .max(10, 'A test cut tries at most 10 forces.'),
});

/** /api/cutters and /api/test-cuts (mounted at /api). */
export function cuttersRouter(db: Db, floor?: FloorBroadcast): Router {
  const router = Router();
  const cutters = new CuttersService(db, new CutFloorEvents(floor));
  const cutFloor = allowRoles('owner', 'lead', 'operator');

  router.get('/cutters', cutFloor, async (_req, res) => {
    res.json(await cutters.list());
  });

  router.post('/cutters/:id/blade-change', cutFloor, async (req, res) => {
    const { id: cutterId } = validate(idParams('cutter'), req.params, 'cutter address');
    res.json(await cutters.bladeChanged(req.principal!, cutterId));
  });

  router.post('/test-cuts', cutFloor, async (req, res) => {
    const input = validate(testCutBody, req.body, 'test cut');
    res.status(201).json(await cutters.recordTestCut(req.principal!, input));
  });

  return router;
}
