import type { StationSocket } from './station-socket';

/** How often a connected station tells the hub it is there: three tries inside the board's 60 s online window. */
export const PRESENCE_PING_MS = 20_000;

/** The part of a socket the heartbeat uses, so specs can hand in a small fake. */
export type PresenceSocket = Pick<StationSocket, 'on' | 'emit' | 'connected'>;

/** Pings the hub ('presence:ping') on every connect and every `everyMs` while connected; stops on disconnect. */
export function keepPresence<S extends PresenceSocket>(socket: S, everyMs = PRESENCE_PING_MS): S {
  let timer: ReturnType<typeof setInterval> | null = null;
  const ping = () => {
    // The hub answers with who it thinks this is; the sighting on its side is what matters here.
    socket.emit('presence:ping', () => undefined);
  };
  const stop = () => {
    if (timer) clearInterval(timer);
    timer = null;
  };
  const start = () => {
    stop();
    ping();
    timer = setInterval(ping, everyMs);
  };
  socket.on('connect', start);
  socket.on('disconnect', stop);
  if (socket.connected) start();
  return socket;
}
