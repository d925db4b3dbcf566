import { applyEvent, DONE_STAGE, owedAt as owedByBag, ROUTE, stageOf, type BagCounts } from '../events/bag-progress';
import type { BagStage, EventKind, StationKind } from '../names';
import type { FloorBagCounts } from './floor-types';

// The floor numbers count exactly as the hub does when it stores events: these wrap its rules.

/** The stages of work in the order a bag meets them. */
export const WORK_ROUTE = ROUTE;

/** The station kind whose good count a done event adds to. */
export const DONE_WORK = DONE_STAGE;

const COUNT_OF = { cut: 'cut', weed: 'weeded', press: 'pressed', pack: 'packed' } as const satisfies Record<StationKind, keyof FloorBagCounts>;

const withPieces = (pieces: number, counts: FloorBagCounts): BagCounts => ({ pieces, ...counts });

/** Counts of a bag nothing has happened to yet. */
export function emptyCounts(): FloorBagCounts {
  return { cut: 0, weeded: 0, pressed: 0, packed: 0, spoiledAt: { cut: 0, weed: 0, press: 0, pack: 0 } };
}

/** Good pieces the bag has delivered from a stage of work. */
export function doneAt(counts: FloorBagCounts, work: StationKind): number {
  return counts[COUNT_OF[work]];
}

/** Good pieces a stage of work owes: the bag's pieces plus the remakes of pieces spoiled later. */
export function owedAt(pieces: number, counts: FloorBagCounts, work: StationKind): number {
  return owedByBag(withPieces(pieces, counts), work);
}

/** Good pieces still to come out of a stage of work (never negative: an over-count owes nothing). */
export function remainingAt(pieces: number, counts: FloorBagCounts, work: StationKind): number {
  return Math.max(0, owedAt(pieces, counts, work) - doneAt(counts, work));
}

/** The furthest stage whose good count reached what it owes; "queued" when none has. */
export function stageOfCounts(pieces: number, counts: FloorBagCounts): BagStage {
  return stageOf(withPieces(pieces, counts));
}

/** The counts after one event; scans and test cuts change nothing. */
export function countEvent(counts: FloorBagCounts, kind: EventKind, quantity: number, spoilStage: StationKind): FloorBagCounts {
  const { pieces: _pieces, ...after } = applyEvent(withPieces(0, counts), kind, quantity, spoilStage);
  return after;
}
