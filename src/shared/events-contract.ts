import type { BagTicket, SizeQuantities } from './intake-contract';
import type { PressCard } from './press/press-contract';
import type { EventKind, StationKind } from './names';

/** What each kind of station event carries beyond its quantity. */
export interface EventPayloads {
  scan: Record<string, never>;
  test_cut: {
    cutterId: number;
    filmTypeId: number;
    /** The ladder tried: the preset force and one step either side. */
    steps: { forceG: number; cutClean: boolean; weededClean: boolean }[];
    chosenForceG: number | null;
  };
  cut_done: { cutterId?: number; rollId?: number; lengthMm?: number };
  weed_done: { rosterLineIds?: number[] };
  press_done: { pressId?: number; temperatureC?: number; dwellS?: number };
  spoil: { stage: StationKind; reasonId: number; note: string; hasPhoto: boolean };
  pack_done: { sizes?: SizeQuantities };
}

/** One thing that happened at a station, made on the tablet (possibly offline) with its own UUID. */
export interface StationEvent<K extends EventKind = EventKind> {
  /** A UUID made on the tablet; the hub's key, so a replay is recognised. */
  id: string;
  bagId: number;
  stationId: number;
  userId: number;
  kind: K;
  /** Pieces (0 for a scan). */
  quantity: number;
  /** When it happened on the tablet (ISO 8601). */
  clientAt: string;
  payload: EventPayloads[K];
}

/** `events:push` and POST /api/events take a batch, in the order the tablet made them. */
export interface EventBatch {
  events: StationEvent[];
}

/** The hub's answer to a batch: every event is in exactly one of the three lists. */
export interface BatchReply {
  accepted: string[];
  /** Already stored before: a replay, not an error. */
  duplicates: string[];
  rejected: { id: string; error: string }[];
}

/** A station's cached view of one open bag, with what it needs to work offline. */
export interface StationTicket extends BagTicket {
  /** Hub-wide increasing change number of this bag, for pulling changes since the last sync. */
  version: number;
  /** Present for press stations whose press and the bag's recipe resolve; null when the card cannot be made. */
  pressCard: PressCard | null;
  /** The sentence saying why there is no press card (missing recipe, no press), when there is none. */
  pressCardProblem: string | null;
}

/** GET /api/tickets?since=<version>: open bags for the signed-in station that changed after `since`. */
export interface TicketsReply {
  version: number;
  tickets: StationTicket[];
  /** Bags that left this station's work (packed, cancelled) since `since`. */
  closedBagIds: number[];
}

/** A reason a piece was spoiled, from the list the lead edits. */
export interface SpoilReason {
  id: number;
  label: string;
  position: number;
  active: boolean;
}

/** What the hub broadcasts to the floor board after a batch changed bags, or with no bag ids after the shop's settings changed. */
export interface BoardUpdate {
  bagIds: number[];
  at: string;
}

/** POST /api/spoils/:eventId/photo (multipart field "photo"): the photo stored for a spoil event, once. */
export interface SpoilPhoto {
  eventId: string;
  mime: 'image/jpeg' | 'image/png' | 'image/webp';
  bytes: number;
  url: string;
  thumbUrl: string;
  createdAt: string;
}
