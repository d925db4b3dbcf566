import type { StationKind } from '../names';
import { remainingAt, WORK_ROUTE } from './bag-counts';
import type { FloorBag, FloorOrder } from './floor-types';
import { addClockHours, type AddWorkingHours } from './working-time';

/** One order's expected finish. */
export interface OrderEta {
  orderId: number;
  code: string;
  dueAt: string;
  /** Good pieces each stage of work still owes this order. */
  remaining: Record<StationKind, number>;
  /** The stage of work with the most hours left for this order; null when nothing is left. */
  bottleneck: StationKind | null;
  /** Pieces per hour used at the bottleneck, and whether it was observed or the shop's standard. */
  bottleneckRate: number | null;
  rateSource: 'observed' | 'standard' | null;
  /** now + remaining pieces at the bottleneck / its rate, in working hours (ISO 8601); null when nothing is left. */
  eta: string | null;
  atRisk: boolean;
}

/**
 * ETA for each order. For every stage of work w the order still needs (remaining_w > 0):
 *   rate_w  = good pieces per working hour observed at w (see working-rate.ts), or the shop's standard rate for w when none was;
 *   hours_w = remaining_w / rate_w.
 * The bottleneck is the w with the largest hours_w (ties go to the later stage), and
 *   ETA = now + hours_bottleneck, counted in working hours (time between shifts does not work);
 *   at risk when ETA > due.
 * The order's pieces flow through the stages together, so the slowest of them sets the finish; this
 * leaves out the time for the last pieces to pass the stages after it, and other orders sharing the stations.
 */
export function orderEtas(
  orders: readonly FloorOrder[],
  bags: readonly FloorBag[],
  observedPiecesPerHour: Record<StationKind, number | null>,
  standardRates: Readonly<Record<StationKind, number>>,
  nowMs: number,
  addWorkingHours: AddWorkingHours = addClockHours,
): OrderEta[] {
  return orders.map((order) => {
    const mine = bags.filter((b) => b.orderId === order.id);
    const remaining = Object.fromEntries(
      WORK_ROUTE.map((w) => [w, mine.reduce((sum, b) => sum + remainingAt(b.pieces, b.counts, w), 0)]),
    ) as Record<StationKind, number>;
    let bottleneck: StationKind | null = null;
    let hours = 0;
    let rate: number | null = null;
    for (const w of WORK_ROUTE) {
      if (remaining[w] === 0) continue;
      const observed = observedPiecesPerHour[w];
      const r = observed !== null && observed > 0 ? observed : standardRates[w];
      if (remaining[w] / r >= hours) [bottleneck, hours, rate] = [w, remaining[w] / r, r];
    }
    const etaMs = bottleneck ? addWorkingHours(nowMs, hours) : null;
    const observedAtBottleneck = bottleneck ? observedPiecesPerHour[bottleneck] : null;
    return {
      orderId: order.id,
      code: order.code,
      dueAt: order.dueAt,
      remaining,
      bottleneck,
      bottleneckRate: rate,
      rateSource: bottleneck ? (observedAtBottleneck !== null && observedAtBottleneck > 0 ? 'observed' : 'standard') : null,
      eta: etaMs === null ? null : new Date(etaMs).toISOString(),
      atRisk: etaMs !== null && etaMs > Date.parse(order.dueAt),
    };
  });
}
