import type { BatchReply, BoardUpdate, EventBatch } from './events-contract';
import type { Role } from './names';

/** What the hub says to a connected client when it says hello. */
export interface HelloReply {
  role: Role;
  stationId: number | null;
  serverTime: string;
}

/** Events the hub sends (names are `subject:verb`). */
export interface ServerToClientEvents {
  'station:seen': (update: { stationId: number; lastSeenAt: string }) => void;
  /** To owners, leads and displays after bags changed. */
  'board:update': (update: BoardUpdate) => void;
  /** To station rooms: these bags changed; pull tickets since your last version. */
  'tickets:changed': (change: { bagIds: number[]; version: number }) => void;
}

/** Events a client sends, each with an acknowledgement. */
export interface ClientToServerEvents {
  'presence:ping': (ack: (reply: HelloReply) => void) => void;
  /** A station's outbox batch, in order; the hub acknowledges each event. */
  'events:push': (batch: EventBatch, ack: (reply: BatchReply | { error: string }) => void) => void;
}

/** Socket rooms, named in one place so sender and receiver agree. */
export const rooms = {
  role: (role: Role) => `role:${role}`,
  station: (stationId: number) => `station:${stationId}`,
} as const;
