import { inWindow, type FloorEvent, type FloorSpoil, type TimeWindow } from './floor-types';

/** One spoil reason's place in the ranking; shares are fractions of all spoiled pieces (0 to 1). */
export interface ParetoRow {
  reason: string;
  quantity: number;
  share: number;
  cumulativeShare: number;
}

/** Spoil reasons summed by label, most pieces first (equal counts by label), with running share. */
export function spoilPareto(spoils: readonly FloorSpoil[]): ParetoRow[] {
  const byReason = new Map<string, number>();
  for (const s of spoils) byReason.set(s.reason, (byReason.get(s.reason) ?? 0) + s.quantity);
  const total = [...byReason.values()].reduce((a, b) => a + b, 0);
  const ranked = [...byReason].sort(([ra, qa], [rb, qb]) => qb - qa || ra.localeCompare(rb));
  let running = 0;
  return ranked.map(([reason, quantity]) => {
    running += quantity;
    return { reason, quantity, share: total > 0 ? quantity / total : 0, cumulativeShare: total > 0 ? running / total : 0 };
  });
}

/** First-pass yield and spoil rate; both null when nothing was attempted. */
export interface FloorYield {
  attempted: number;
  spoiled: number;
  /** (attempted - spoiled) / attempted */
  firstPassYield: number | null;
  /** spoiled / attempted */
  spoilRate: number | null;
}

/** Yield from pieces attempted and pieces spoiled. */
export function floorYield(attempted: number, spoiled: number): FloorYield {
  return {
    attempted,
    spoiled,
    firstPassYield: attempted > 0 ? (attempted - spoiled) / attempted : null,
    spoilRate: attempted > 0 ? spoiled / attempted : null,
  };
}

/**
 * Yield from the events in a window. A piece is attempted once each time it is started at the first
 * stage of work, so attempted = good pieces cut + pieces spoiled at cut (a remake is a new attempt);
 * spoiled = every spoil event's pieces, wherever they were lost.
 */
export function floorYieldFromEvents(events: readonly FloorEvent[], window: TimeWindow): FloorYield {
  let attempted = 0;
  let spoiled = 0;
  for (const e of events) {
    if (!inWindow(Date.parse(e.at), window)) continue;
    if (e.kind === 'cut_done') attempted += e.quantity;
    if (e.kind === 'spoil') {
      spoiled += e.quantity;
      if ((e.spoilStage ?? e.stationKind) === 'cut') attempted += e.quantity;
    }
  }
  return floorYield(attempted, spoiled);
}
