import type { BagStage } from '../names';
import { countEvent, emptyCounts, stageOfCounts } from './bag-counts';
import type { FloorBag, FloorEvent } from './floor-types';

/** A bag's stage changes in time order, starting with "queued" at its release to the floor. */
export interface StageTimeline {
  bagId: number;
  pieces: number;
  changes: { stage: BagStage; atMs: number }[];
}

/**
 * Replays a bag's events in time order, counting as the hub does, and notes each time its stage
 * changed. A spoil can move a bag back (a remake must be cut again); that is a change too.
 */
export function stageTimeline(bag: FloorBag, events: readonly FloorEvent[]): StageTimeline {
  const mine = events.filter((e) => e.bagId === bag.id).sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const changes: StageTimeline['changes'] = [{ stage: 'queued', atMs: Date.parse(bag.queuedAt) }];
  let counts = emptyCounts();
  for (const event of mine) {
    counts = countEvent(counts, event.kind, event.quantity, event.spoilStage ?? event.stationKind);
    const stage = stageOfCounts(bag.pieces, counts);
    if (stage !== changes[changes.length - 1].stage) changes.push({ stage, atMs: Date.parse(event.at) });
  }
  return { bagId: bag.id, pieces: bag.pieces, changes };
}

/** Timelines for many bags, reading the events once per bag. */
export function stageTimelines(bags: readonly FloorBag[], events: readonly FloorEvent[]): StageTimeline[] {
  const byBag = new Map<number, FloorEvent[]>();
  for (const e of events) byBag.set(e.bagId, [...(byBag.get(e.bagId) ?? []), e]);
  return bags.map((bag) => stageTimeline(bag, byBag.get(bag.id) ?? []));
}

/** The bag's stage at a moment; null before it was released to the floor. */
export function stageAt(timeline: StageTimeline, atMs: number): BagStage | null {
  let stage: BagStage | null = null;
  for (const change of timeline.changes) {
    if (change.atMs > atMs) break;
    stage = change.stage;
  }
  return stage;
}

/** When the bag first reached "packed" (left the floor); null if it has not. */
export function packedAtMs(timeline: StageTimeline): number | null {
  return timeline.changes.find((c) => c.stage === 'packed')?.atMs ?? null;
}
