import { InjectionToken } from '@angular/core';
import { io, type Socket } from 'socket.io-client';
import type { ClientToServerEvents, ServerToClientEvents } from '../../shared/socket-contract';

/** The socket.io connection the floor board keeps to the hub (same origin, session cookie). */
export type BoardSocket = Socket<ServerToClientEvents, ClientToServerEvents>;

/** Makes the board's socket, not yet connected; specs give a fake. */
export const BOARD_SOCKET = new InjectionToken<() => BoardSocket>('BOARD_SOCKET', {
  providedIn: 'root',
  factory: () => () => io({ withCredentials: true, autoConnect: false }),
});
