import type { BagStage, StationKind } from './names';

/** A station on the floor board. Rates are good pieces finished per hour; null before any time has passed. */
export interface BoardStation {
  id: number;
  name: string;
  kind: StationKind;
  /** Rolling hour (the last 60 minutes, or since the shift start if later). */
  piecesPerHour: number | null;
  shiftPieces: number;
  shiftPiecesPerHour: number | null;
  /** Heard from (socket heartbeat or event batch) within BOARD_ONLINE_SECONDS. */
  online: boolean;
  lastEventAt: string | null;
  lastSyncAt: string | null;
  lastSeenAt: string | null;
}

/** Bags and pieces sitting in one stage. */
export interface BoardStageLoad {
  bags: number;
  pieces: number;
}

/** An open order with its expected finish. */
export interface BoardOrder {
  id: number;
  code: string;
  customerName: string;
  dueAt: string;
  /** Null when nothing is left to do. */
  etaAt: string | null;
  atRisk: boolean;
  /** Good pieces the order's slowest remaining stage still owes. */
  remainingPieces: number;
  bottleneck: StationKind | null;
  /** Whether the bottleneck's rate was observed this shift or is the shop's standard rate. */
  rateSource: 'observed' | 'standard' | null;
}

/** One spoil reason in the Pareto ranking; shares are fractions 0 to 1. */
export interface BoardSpoilReason {
  reason: string;
  pieces: number;
  share: number;
  cumulativeShare: number;
}

/** A roll below its reorder length. */
export interface BoardLowRoll {
  id: number;
  label: string;
  film: string;
  rackSlot: string;
  remainingIn: number;
  reorderIn: number;
}

/** Something the lead should look at: an over-count accepted from a station. */
export interface BoardFlag {
  kind: 'over_count';
  bagId: number;
  bagCode: string;
  orderCode: string;
  message: string;
  at: string;
}

/** Good pieces per station in each hour of the shift so far, for the chart. */
export interface BoardHourly {
  /** Start of each hour slot (ISO 8601), from the shift start. */
  hours: string[];
  stations: { id: number; name: string; pieces: number[] }[];
}

/** GET /api/board (owner, lead, display). */
export interface BoardReply {
  generatedAt: string;
  shift: { startAt: string; endAt: string };
  stations: BoardStation[];
  stages: Record<BagStage, BoardStageLoad>;
  /** Open orders, soonest due first. */
  orders: BoardOrder[];
  /** Null when nothing was attempted this shift. */
  firstPassYield: number | null;
  spoilRate: number | null;
  spoilReasons: BoardSpoilReason[];
  /** Seconds per piece the day's due pieces ask for; null when none are due. */
  taktS: number | null;
  piecesDueToday: number;
  lowRolls: BoardLowRoll[];
  flags: BoardFlag[];
  hourly: BoardHourly;
}

/** A station counts as online when heard from within this many seconds (tablets ping every 20 s). */
export const BOARD_ONLINE_SECONDS = 60;
