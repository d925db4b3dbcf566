import { STATION_KINDS, type StationKind } from '../names';
import { DONE_WORK } from './bag-counts';
import { HOUR_MS, inWindow, type FloorEvent, type TimeWindow } from './floor-types';

const MINUTE_MS = 60_000;

/**
 * The longest pause between two events at a station that still counts as working time (changing
 * bags, fetching garments). A longer one is the bench standing idle, usually for want of bags. Dwell's own rule.
 */
export const LONGEST_WORKING_PAUSE_MS = 20 * MINUTE_MS;

/**
 * The longest a station may spend between two events about the same bag (opening it, then finishing
 * pieces of it) and still be counted as working on it: a big weed can take most of an hour. Longer, the
 * bag was most likely left open over a break. Dwell's own rule.
 */
export const LONGEST_SPELL_ON_ONE_BAG_MS = 2 * HOUR_MS;

/**
 * Fewest good pieces a stage must have finished in working time before its observed rate stands for
 * the stage in an ETA. Below it (a bench that has only just started) one quick or slow bag would swing
 * every order's ETA, and the shop's standard rate is used. Dwell's own rule.
 */
export const MIN_PIECES_FOR_OBSERVED_RATE = 12;

/** Good pieces a station finished in working time, and that working time. */
export interface StationWorkingOutput {
  stationId: number;
  kind: StationKind;
  pieces: number;
  workingHours: number;
}

/**
 * Each station's output over its working time within the window. Walking a station's events (any
 * kind: a scan when a bag is opened counts as the start of work on it) in the order its own clock
 * recorded them (work done offline reaches the hub in one batch), the time since
 * the event before is working time when it is short (at most LONGEST_WORKING_PAUSE_MS), or when both
 * events are about the same bag and it is at most LONGEST_SPELL_ON_ONE_BAG_MS; the good pieces the
 * later event finished are then counted against it. Pieces finished after an idle spell are left out,
 * as the time they took is not known.
 */
export function stationWorkingOutput(events: readonly FloorEvent[], window: TimeWindow): StationWorkingOutput[] {
  const byStation = new Map<number, { kind: StationKind; times: { atMs: number; event: FloorEvent }[] }>();
  for (const event of events) {
    if (!inWindow(Date.parse(event.at), window)) continue;
    const station = byStation.get(event.stationId) ?? { kind: event.stationKind, times: [] };
    station.times.push({ atMs: Date.parse(event.recordedAt ?? event.at), event });
    byStation.set(event.stationId, station);
  }
  return [...byStation].map(([stationId, { kind, times }]) => {
    times.sort((a, b) => a.atMs - b.atMs);
    let pieces = 0;
    let workingMs = 0;
    for (let i = 1; i < times.length; i++) {
      const gap = times[i].atMs - times[i - 1].atMs;
      const sameBag = times[i].event.bagId === times[i - 1].event.bagId;
      if (gap > LONGEST_WORKING_PAUSE_MS && !(sameBag && gap <= LONGEST_SPELL_ON_ONE_BAG_MS)) continue;
      workingMs += gap;
      if (DONE_WORK[times[i].event.kind]) pieces += times[i].event.quantity;
    }
    return { stationId, kind, pieces, workingHours: workingMs / HOUR_MS };
  });
}

/**
 * The rate each stage of work has shown while working, as an ETA may rely on it: the sum over the
 * stage's stations of good pieces per working hour (benches of a kind work side by side), once the
 * stage has finished at least MIN_PIECES_FOR_OBSERVED_RATE pieces in working time; null before that.
 * Idle time is left out, so a bench starved of bags is not taken for a slow one.
 */
export function workingRatesByWork(events: readonly FloorEvent[], window: TimeWindow): Record<StationKind, number | null> {
  const stations = stationWorkingOutput(events, window);
  const entries = STATION_KINDS.map((work) => {
    const mine = stations.filter((s) => s.kind === work && s.workingHours > 0);
    const pieces = mine.reduce((sum, s) => sum + s.pieces, 0);
    const rate = mine.reduce((sum, s) => sum + s.pieces / s.workingHours, 0);
    return [work, pieces >= MIN_PIECES_FOR_OBSERVED_RATE ? rate : null];
  });
  return Object.fromEntries(entries) as Record<StationKind, number | null>;
}
