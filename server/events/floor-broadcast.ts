import { rooms } from '../../src/shared/socket-contract';
import type { Hub } from '../realtime/socket-server';

// Owners, leads and wall displays watch the floor board.
const BOARD_ROOMS = [rooms.role('owner'), rooms.role('lead'), rooms.role('display')];

/** Tells the floor what changed: the board once per batch or settings change, and every station to pull tickets. */
export class FloorBroadcast {
  private io: Hub | null = null;

  /** Connects the broadcaster to the socket server once it exists (the app is built before it). */
  attach(io: Hub): void {
    this.io = io;
  }

  /** One board:update to owners, leads and displays, one tickets:changed to every signed-in station. */
  bagsChanged(bagIds: number[], version: number): void {
    if (!this.io || bagIds.length === 0) return;
    this.io.to(BOARD_ROOMS).emit('board:update', { bagIds, at: new Date().toISOString() });
    // Every operator socket is in the operator room, so this reaches each station room at once.
    this.io.to(rooms.role('operator')).emit('tickets:changed', { bagIds, version });
  }

  /** The shop's hours, days or rates changed: every board refetches, though no bag did (so no bag ids). */
  shopChanged(): void {
    this.io?.to(BOARD_ROOMS).emit('board:update', { bagIds: [], at: new Date().toISOString() });
  }
}
