import type { Server as HttpServer } from 'node:http';
import type { RequestHandler } from 'express';
import { Server, type Socket } from 'socket.io';
import { rooms, type ClientToServerEvents, type ServerToClientEvents } from '../../src/shared/socket-contract';
import { resolvePrincipal, type Principal } from '../auth/principal';
import type { Db } from '../db/tables';
import { handleEventPushes } from '../events/events-socket';
import type { EventFollowers } from '../events/event-followers';
import { FloorBroadcast } from '../events/floor-broadcast';
import { PresenceRepository } from './presence-repository';

interface SocketData {
  principal: Principal;
}

/** The hub's socket server type, shared by every feature that broadcasts. */
export type Hub = Server<ClientToServerEvents, ServerToClientEvents, Record<string, never>, SocketData>;

type IncomingRequest = Parameters<RequestHandler>[0];

/** Attaches socket.io to the HTTP server: same session cookie, rooms by role and by station. */
export function attachSocketServer(httpServer: HttpServer, db: Db, session: RequestHandler, followers: EventFollowers = { floor: new FloorBroadcast() }): Hub {
  const io: Hub = new Server(httpServer, { serveClient: false, cors: { origin: false } });
  followers.floor.attach(io);
  const presence = new PresenceRepository(db);

  // The same express-session middleware reads the cookie on the handshake.
  io.engine.use(session);

  io.use(async (socket, next) => {
    const stored = (socket.request as IncomingRequest).session?.principal;
    const principal = stored ? await resolvePrincipal(db, stored) : null;
    if (!principal) return next(new Error('Sign in first.'));
    socket.data.principal = principal;
    next();
  });

  io.on('connection', async (socket: Socket<ClientToServerEvents, ServerToClientEvents, Record<string, never>, SocketData>) => {
    const { principal } = socket.data;
    handleEventPushes(socket, db, followers);
    await socket.join(rooms.role(principal.role));
    if (principal.station) await socket.join(rooms.station(principal.station.id));

    // A station tablet is seen when it connects and on each ping; the board shows it online from then.
    const markSeen = async (now: Date) => {
      if (!principal.station) return;
      try {
        if (!(await presence.markSeen(principal.station.id, now))) return;
      } catch {
        return; // The database is away for a moment: the next ping marks the station again.
      }
      io.to([rooms.role('lead'), rooms.role('owner'), rooms.role('display')]).emit('station:seen', {
        stationId: principal.station.id,
        lastSeenAt: now.toISOString(),
      });
    };

    socket.on('presence:ping', async (ack) => {
      if (typeof ack !== 'function') return;
      const now = new Date();
      await markSeen(now);
      ack({ role: principal.role, stationId: principal.station?.id ?? null, serverTime: now.toISOString() });
    });

    await markSeen(new Date());
  });

  return io;
}
