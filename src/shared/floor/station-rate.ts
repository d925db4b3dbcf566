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

/**
 * The shift's working time so far. It starts at the shift start or, when pieces were finished before
 * it (work begun early, after the shift opened), at the start of the hour of the shift's clock in
 * which the first of them fell, so the hourly chart and the rates share their hours. While the shift
 * runs it ends now; once the shift has ended, at its end or at the last piece finished after it
 * (overtime), so the hours after everyone went home do not thin out the rates and the ETAs built on them.
 */
export function shiftSoFarWindow(shift: FloorShift, events: readonly FloorEvent[] = []): TimeWindow {
  const startMs = Date.parse(shift.startAt);
  const openedMs = shift.openedAt ? Date.parse(shift.openedAt) : startMs;
  const nowMs = Date.parse(shift.now);
  const endMs = Date.parse(shift.endAt);
  let firstDone = startMs;
  let lastDone = endMs;
  for (const e of events) {
    const at = Date.parse(e.at);
    if (!DONE_WORK[e.kind] || at > nowMs) continue;
    if (at > openedMs && at < firstDone) firstDone = at;
    if (at > lastDone) lastDone = at;
  }
  // One millisecond more, so a piece right on the hour is inside the window (which leaves its start out).
  const earlyHours = firstDone < startMs ? Math.ceil((startMs - firstDone + 1) / HOUR_MS) : 0;
  const fromMs = Math.max(openedMs, startMs - earlyHours * HOUR_MS);
  return { fromMs: Math.min(fromMs, nowMs), toMs: nowMs <= endMs ? nowMs : lastDone };
}

/** The rolling hour ends now and starts an hour earlier, or where the shift's working time starts if that is later. */
export function rollingHourWindow(shift: FloorShift, events: readonly FloorEvent[] = []): TimeWindow {
  const now = Date.parse(shift.now);
  return { fromMs: Math.max(now - HOUR_MS, shiftSoFarWindow(shift, events).fromMs), toMs: now };
}

/** Good pieces (done events only; spoils and scans are not output) matching a test within a window. */
export function donePieces(events: readonly FloorEvent[], window: TimeWindow, match: (event: FloorEvent) => boolean): number {
  return events.reduce((sum, e) => (DONE_WORK[e.kind] && match(e) && inWindow(Date.parse(e.at), window) ? sum + e.quantity : sum), 0);
}

/** Pieces per hour for every station, rolling hour and shift so far. */
export function stationRates(stations: readonly FloorStation[], events: readonly FloorEvent[], shift: FloorShift): StationRate[] {
  const rolling = rollingHourWindow(shift, events);
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
