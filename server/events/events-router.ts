import { Router } from 'express';
import type { StationEvent } from '../../src/shared/events-contract';
import { allowRoles } from '../auth/guards';
import type { Db } from '../db/tables';
import { validate } from '../http/validate';
import { eventBatchSchema } from './event-schemas';
import { EventsService } from './events-service';
import type { EventFollowers } from './event-followers';

/** POST /api/events: a station's outbox batch over HTTP, the same as events:push over the socket. */
export function eventsRouter(db: Db, followers: EventFollowers): Router {
  const router = Router();
  const events = new EventsService(db, followers);

  router.post('/', allowRoles('operator'), async (req, res) => {
    const batch = validate(eventBatchSchema, req.body ?? {}, 'event batch');
    res.json(await events.ingest(req.principal!, batch.events as StationEvent[]));
  });

  return router;
}
