import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { idParams, validate } from '../http/validate';
import { RollsService } from './rolls-service';

// Longest roll Dwell accepts: 100 m, beyond any vinyl roll a small shop buys (common practice, no published source).
const MAX_ROLL_MM = 100_000;
const mm = (what: string, max: number) =>
  z.number({ error: `${what} is a number of millimetres.` }).int(`${what} is whole millimetres.`).min(0, `${what} cannot be negative.`).max(max, `${what} is at most ${max} mm.`);

const createBody = z.object({
  filmId: z.number({ error: 'Choose the film on the roll.' }).int().positive('Choose the film on the roll.'),
  label: z.string({ error: 'Write the label from the core, e.g. R-120.' }).trim().min(1, 'Write the label from the core, e.g. R-120.').max(40, 'A label is at most 40 characters.'),
  widthMm: mm('The width', 3000).min(50, 'A roll is at least 50 mm wide.'),
  lengthMm: mm('The length when new', MAX_ROLL_MM).min(1, 'A roll has some length.'),
  remainingMm: mm('The remaining length', MAX_ROLL_MM).optional(),
  reorderMm: mm('The reorder length', MAX_ROLL_MM),
  rackSlot: z.string().trim().max(20, 'A rack slot is at most 20 characters.').optional(),
});
const measureBody = z.object({
  remainingMm: mm('The measured length', MAX_ROLL_MM),
  note: z.string().trim().max(400, 'A note is at most 400 characters.').default(''),
});
const listQuery = z.object({ filmId: z.coerce.number().int().positive().optional() });

/** /api/rolls: the roll rack. */
export function rollsRouter(db: Db): Router {
  const router = Router();
  const rolls = new RollsService(db);
  const rack = allowRoles('owner', 'lead', 'operator');

  router.get('/', rack, async (req, res) => {
    const { filmId } = validate(listQuery, req.query, 'roll filter');
    res.json(await rolls.list(filmId));
  });

  router.post('/', allowRoles('owner', 'lead'), async (req, res) => {
    const input = validate(createBody, req.body, 'new roll');
    res.status(201).json(await rolls.create(input, req.principal!.userId));
  });

  router.post('/:id/measure', rack, async (req, res) => {
    const { id } = validate(idParams('roll'), req.params, 'roll address');
    const { remainingMm, note } = validate(measureBody, req.body, 'measure');
    res.json(await rolls.measure(id, remainingMm, note, req.principal!.userId));
  });

  router.get('/:id/movements', rack, async (req, res) => {
    const { id } = validate(idParams('roll'), req.params, 'roll address');
    res.json(await rolls.movements(id));
  });

  return router;
}
