import { BAG_STAGES, STATION_KINDS, type BagStage, type StationKind } from '../names';
import { DONE_WORK } from './bag-counts';
import { HOUR_MS, perHour, type FloorEvent, type TimeWindow } from './floor-types';
import { packedAtMs, type StageTimeline } from './stage-timeline';
import { donePieces } from './station-rate';

/** Good pieces finished at each stage of work over a window. */
export function piecesByWork(events: readonly FloorEvent[], window: TimeWindow): Record<StationKind, number> {
  const entries = STATION_KINDS.map((work) => [work, donePieces(events, window, (e) => DONE_WORK[e.kind] === work)]);
  return Object.fromEntries(entries) as Record<StationKind, number>;
}

/** Good pieces per hour finished at each stage of work over a window (null: the window has no length). */
export function throughputByWork(events: readonly FloorEvent[], window: TimeWindow): Record<StationKind, number | null> {
  const pieces = piecesByWork(events, window);
  const entries = STATION_KINDS.map((work) => [work, perHour(pieces[work], window)]);
  return Object.fromEntries(entries) as Record<StationKind, number | null>;
}

/**
 * Average hours a bag stayed in each stage, over stays that ended within the window
 * (a stay ends at the bag's next stage change); null when none ended there. "packed" never ends.
 */
export function averageHoursInStage(timelines: readonly StageTimeline[], window: TimeWindow): Record<BagStage, number | null> {
  const totals = new Map<BagStage, { hours: number; stays: number }>();
  for (const { changes } of timelines) {
    for (let i = 0; i + 1 < changes.length; i++) {
      const end = changes[i + 1].atMs;
      if (end <= window.fromMs || end > window.toMs) continue;
      const total = totals.get(changes[i].stage) ?? { hours: 0, stays: 0 };
      totals.set(changes[i].stage, { hours: total.hours + (end - changes[i].atMs) / HOUR_MS, stays: total.stays + 1 });
    }
  }
  const entries = BAG_STAGES.map((stage) => {
    const total = totals.get(stage);
    return [stage, total ? total.hours / total.stays : null];
  });
  return Object.fromEntries(entries) as Record<BagStage, number | null>;
}

/** What left the floor (reached "packed") within a window, and how long it had been on it. */
export interface SystemFlow {
  bagsOut: number;
  piecesOut: number;
  bagsPerHour: number | null;
  piecesPerHour: number | null;
  /** Mean over bags of (first packed time - release time); null when no bag left. */
  averageHoursInSystem: number | null;
  /** The same mean weighted by each bag's pieces: the W that pairs with WIP and throughput in pieces. */
  pieceWeightedHoursInSystem: number | null;
}

/** Throughput out of the floor and time in system, over bags packed within the window. */
export function systemFlow(timelines: readonly StageTimeline[], window: TimeWindow): SystemFlow {
  let bagsOut = 0;
  let piecesOut = 0;
  let bagHours = 0;
  let pieceHours = 0;
  for (const timeline of timelines) {
    const out = packedAtMs(timeline);
    if (out === null || out <= window.fromMs || out > window.toMs) continue;
    const hours = (out - timeline.changes[0].atMs) / HOUR_MS;
    bagsOut += 1;
    piecesOut += timeline.pieces;
    bagHours += hours;
    pieceHours += hours * timeline.pieces;
  }
  return {
    bagsOut,
    piecesOut,
    bagsPerHour: perHour(bagsOut, window),
    piecesPerHour: perHour(piecesOut, window),
    averageHoursInSystem: bagsOut > 0 ? bagHours / bagsOut : null,
    pieceWeightedHoursInSystem: piecesOut > 0 ? pieceHours / piecesOut : null,
  };
}
