import { InjectionToken } from '@angular/core';
import { io, type Socket } from 'socket.io-client';
import type { ClientToServerEvents, ServerToClientEvents } from '../../shared/socket-contract';
import { keepPresence } from './presence-heartbeat';

/** The socket.io connection a station keeps to the hub (same origin, session cookie). */
export type StationSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** Makes the station's socket, which pings the hub while connected; not connected until the sync service starts. Specs give a fake. */
export const STATION_SOCKET = new InjectionToken<() => StationSocket>('STATION_SOCKET', {
  providedIn: 'root',
  factory: () => () => keepPresence(io({ withCredentials: true, autoConnect: false })),
});
