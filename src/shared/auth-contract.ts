import type { Role, StationKind } from './names';

/** The signed-in person (or wall display) as the API reports it. */
export interface SessionUser {
  id: number;
  name: string;
  email: string | null;
  role: Role;
}

/** The station a tablet is paired with. */
export interface StationSummary {
  id: number;
  name: string;
  kind: StationKind;
}

/** Answer of sign-in calls and of GET /api/auth/me. */
export interface SessionReply {
  user: SessionUser;
  station: StationSummary | null;
}

/** Answer of POST /api/auth/device: what a paired tablet shows before a PIN. */
export interface DeviceReply {
  station: StationSummary;
  operators: { id: number; name: string }[];
}

/** A station as the Stations screen lists it. */
export interface StationListItem extends StationSummary {
  paired: boolean;
  pairedAt: string | null;
  lastSeenAt: string | null;
}

/** Answer of POST /api/stations/:id/pair: shown once, kept only by the tablet. */
export interface PairReply {
  deviceToken: string;
  station: StationSummary;
}
