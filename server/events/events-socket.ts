import type { RequestHandler } from 'express';
import type { Socket } from 'socket.io';
import type { StationEvent } from '../../src/shared/events-contract';
import type { ClientToServerEvents, ServerToClientEvents } from '../../src/shared/socket-contract';
import { resolvePrincipal, type Principal } from '../auth/principal';
import type { Db } from '../db/tables';
import { eventBatchSchema } from './event-schemas';
import { EventsService } from './events-service';
import type { EventFollowers } from './event-followers';

type HubSocket = Socket<ClientToServerEvents, ServerToClientEvents, Record<string, never>, { principal: Principal }>;
type IncomingRequest = Parameters<RequestHandler>[0];

/** Registers events:push on a connected socket: the batch goes through the same EventsService as POST /api/events. */
export function handleEventPushes(socket: HubSocket, db: Db, followers: EventFollowers): void {
  const events = new EventsService(db, followers);
  socket.on('events:push', async (batch, ack) => {
    if (typeof ack !== 'function') return;
    const parsed = eventBatchSchema.safeParse(batch);
    if (!parsed.success) return ack({ error: `The batch is not valid (${parsed.error.issues[0]?.message}). Send { events: [...] }.` });
    try {
      // Re-read who is signed in: a tablet unpaired since it connected must not keep pushing.
      const stored = (socket.request as IncomingRequest).session?.principal;
      const principal = stored ? await resolvePrincipal(db, stored) : null;
      if (!principal) return ack({ error: 'Sign in first.' });
      ack(await events.ingest(principal, parsed.data.events as StationEvent[]));
    } catch {
      // The events before the failure are stored; the tablet pushes again and they come back as duplicates.
      ack({ error: 'The hub could not store the batch just now. The tablet keeps the events and tries again.' });
    }
  });
}
