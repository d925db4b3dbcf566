import { remainingAt } from './bag-counts';
import type { FloorBag, FloorOrder, FloorShift } from './floor-types';

/** Takt time: available seconds / pieces demanded; null when nothing is demanded. */
export function taktSeconds(availableSeconds: number, piecesDemanded: number): number | null {
  return piecesDemanded > 0 ? availableSeconds / piecesDemanded : null;
}

/** The pace today's due pieces ask for. */
export interface TodayTakt {
  /** Seconds from now (or the shift start, if later) to the shift end; never negative. */
  availableSeconds: number;
  /** Pieces not yet packed on orders due by the shift end, overdue ones included. */
  piecesDue: number;
  secondsPerPiece: number | null;
}

/** Takt time for the pieces due today, over what is left of the shift (breaks are not subtracted). */
export function taktForToday(shift: FloorShift, orders: readonly FloorOrder[], bags: readonly FloorBag[]): TodayTakt {
  const endMs = Date.parse(shift.endAt);
  const fromMs = Math.max(Date.parse(shift.now), Date.parse(shift.startAt));
  const availableSeconds = Math.max(0, endMs - fromMs) / 1000;
  const dueToday = new Set(orders.filter((o) => Date.parse(o.dueAt) <= endMs).map((o) => o.id));
  const piecesDue = bags.filter((b) => dueToday.has(b.orderId)).reduce((sum, b) => sum + remainingAt(b.pieces, b.counts, 'pack'), 0);
  return { availableSeconds, piecesDue, secondsPerPiece: taktSeconds(availableSeconds, piecesDue) };
}
