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
}

/** Events a client sends, each with an acknowledgement. */
export interface ClientToServerEvents {
  'presence:ping': (ack: (reply: HelloReply) => void) => void;
}

/** Socket rooms, named in one place so sender and receiver agree. */
export const rooms = {
  role: (role: Role) => `role:${role}`,
  station: (stationId: number) => `station:${stationId}`,
} as const;
