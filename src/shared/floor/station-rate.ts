import { DONE_WORK } from './bag-counts';
import { HOUR_MS, inWindow, perHour, type FloorEvent, type FloorShift, type FloorStation, type TimeWindow } from './floor-types';

/** Good pieces a station finished, and the rate, over the rolling hour and over the shift so far. */
export interface StationRate {
  stationId: number;
  name: string;
  rollingHourPieces: number;
  /** Null when the window has no length yet (now is at the shift start). */
  rollingHourPiecesPerHour: number | null;
  shiftPieces: number;
  shiftPiecesPerHour: number | null;
}

/** The rolling hour ends now and starts an hour earlier, or at the shift start if that is later. */
export function rollingHourWindow(shift: FloorShift): TimeWindow {
  const now = Date.parse(shift.now);
  return { fromMs: Math.max(now - HOUR_MS, Date.parse(shift.startAt)), toMs: now };
}

/**
 * The shift's working time so far: from its start to now while it runs. Once it has ended, to its end,
 * or to the last piece finished after it (overtime), so the hours after everyone went home do not
 * thin out the shift's rates and the ETAs built on them.
 */
export function shiftSoFarWindow(shift: FloorShift, events: readonly FloorEvent[] = []): TimeWindow {
  const fromMs = Date.parse(shift.startAt);
  const nowMs = Date.parse(shift.now);
  const endMs = Date.parse(shift.endAt);
  if (nowMs <= endMs) return { fromMs, toMs: nowMs };
  const lastDone = events.reduce((last, e) => {
    const at = Date.parse(e.at);
    return DONE_WORK[e.kind] && at <= nowMs && at > last ? at : last;
  }, endMs);
  return { fromMs, toMs: lastDone };
}

/** Good pieces (done events only; spoils and scans are not output) matching a test within a window. */
export function donePieces(events: readonly FloorEvent[], window: TimeWindow, match: (event: FloorEvent) => boolean): number {
  return events.reduce((sum, e) => (DONE_WORK[e.kind] && match(e) && inWindow(Date.parse(e.at), window) ? sum + e.quantity : sum), 0);
}

/** Pieces per hour for every station, rolling hour and shift so far. */
export function stationRates(stations: readonly FloorStation[], events: readonly FloorEvent[], shift: FloorShift): StationRate[] {
  const rolling = rollingHourWindow(shift);
  const soFar = shiftSoFarWindow(shift, events);
  return stations.map((station) => {
    const mine = (e: FloorEvent) => e.stationId === station.id;
    const rollingHourPieces = donePieces(events, rolling, mine);
    const shiftPieces = donePieces(events, soFar, mine);
    return {
      stationId: station.id,
      name: station.name,
      rollingHourPieces,
      rollingHourPiecesPerHour: perHour(rollingHourPieces, rolling),
      shiftPieces,
      shiftPiecesPerHour: perHour(shiftPieces, soFar),
    };
  });
}
