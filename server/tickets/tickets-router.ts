import { Router } from 'express';
import { z } from 'zod';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { validate } from '../http/validate';
import { TicketsService } from './tickets-service';

const sinceQuery = z.object({
  since: z.coerce
    .number({ error: 'since is the version number from your last pull (0 for everything).' })
    .int('since is a whole number.')
    .min(0, 'since is 0 or more.')
    .default(0),
});
const tokenParams = z.object({ token: z.string().max(100) });

/** /api/tickets: a station's open bags changed since its last pull, and one bag's ticket by its label. */
export function ticketsRouter(db: Db): Router {
  const router = Router();
  const tickets = new TicketsService(db);

  router.get('/', allowRoles('operator'), async (req, res) => {
    const { since } = validate(sinceQuery, req.query, 'tickets request');
    res.json(await tickets.changedSince(req.principal!, since));
  });

  router.get('/by-token/:token', allowRoles('operator', 'lead'), async (req, res) => {
    const { token } = validate(tokenParams, req.params, 'bag address');
    res.json(await tickets.byToken(req.principal!, token));
  });

  return router;
}
