import type { BagStage, EventKind, StationKind } from '../names';

/** One stored station event as the floor numbers read it; `at` is the hub's receive time (ISO 8601). */
export interface FloorEvent {
  bagId: number;
  stationId: number;
  stationKind: StationKind;
  kind: EventKind;
  /** Pieces (0 for a scan). */
  quantity: number;
  at: string;
  /**
   * When the station's tablet recorded it, by the tablet's own clock (ISO 8601). Time between one
   * station's events is measured on it, as work done offline reaches the hub in one batch; `at` when absent.
   */
  recordedAt?: string;
  /** For a spoil: the stage of work where the pieces were lost; the station's kind when absent. */
  spoilStage?: StationKind;
}

/** Good pieces out of each stage of work and pieces spoiled at each, as the hub keeps them on a bag. */
export interface FloorBagCounts {
  cut: number;
  weeded: number;
  pressed: number;
  packed: number;
  spoiledAt: Record<StationKind, number>;
}

/** A bag as the floor numbers read it; `queuedAt` is when it was released to the floor (ISO 8601). */
export interface FloorBag {
  id: number;
  orderId: number;
  stage: BagStage;
  pieces: number;
  counts: FloorBagCounts;
  queuedAt: string;
}

/** An order with its due time (ISO 8601). */
export interface FloorOrder {
  id: number;
  code: string;
  dueAt: string;
}

/** A station on the floor. */
export interface FloorStation {
  id: number;
  kind: StationKind;
  name: string;
}

/** Pieces spoiled for one reason (one spoil report, or a sum of them). */
export interface FloorSpoil {
  reason: string;
  quantity: number;
}

/** The shift being reported on; all ISO 8601. */
export interface FloorShift {
  startAt: string;
  endAt: string;
  now: string;
  /**
   * From when work counts towards this shift: halfway through the break before it, so work begun
   * early belongs to it and overtime to the shift before. The shift start when absent.
   */
  openedAt?: string;
}

/** A span of time in epoch milliseconds: events with fromMs < at <= toMs fall in it. */
export interface TimeWindow {
  fromMs: number;
  toMs: number;
}

export const HOUR_MS = 3_600_000;

/** Whether an epoch-millisecond time falls in the window (start excluded, end included). */
export function inWindow(atMs: number, window: TimeWindow): boolean {
  return atMs > window.fromMs && atMs <= window.toMs;
}

/** Pieces per hour over a window; null when the window has no length. */
export function perHour(pieces: number, window: TimeWindow): number | null {
  const hours = (window.toMs - window.fromMs) / HOUR_MS;
  return hours > 0 ? pieces / hours : null;
}
