import type { FloorBag, FloorEvent } from '../../src/shared/floor/floor-types';
import { packedAtMs, stageAt, stageTimelines } from '../../src/shared/floor/stage-timeline';
import { averageHoursInStage, systemFlow } from '../../src/shared/floor/throughput';
import { workInProgress } from '../../src/shared/floor/work-in-progress';
import { STATION_KINDS, type BagStage } from '../../src/shared/names';

const T0 = Date.parse('2026-03-02T00:00:00Z');
const MIN = 60_000;
const HOUR = 60 * MIN;

/** Seeded generator (mulberry32) so the simulated floor is the same on every run. */
function seeded(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A steady floor: bags arrive at random (exponential gaps, mean 10 min), 1 to 12 pieces each, and
 * pass four single-station stages first come, first served, at fixed minutes per piece. The weed
 * station is the busiest (6 bags/h x 6.5 pieces x 1.2 min = 78% busy), so queues form.
 */
function simulateFloor(hours: number): { bags: FloorBag[]; events: FloorEvent[] } {
  const random = seeded(20260302);
  const minutesPerPiece = { cut: 0.9, weed: 1.2, press: 1.0, pack: 0.5 };
  const doneKind = { cut: 'cut_done', weed: 'weed_done', press: 'press_done', pack: 'pack_done' } as const;
  const freeAt = { cut: T0, weed: T0, press: T0, pack: T0 };
  const bags: FloorBag[] = [];
  const events: FloorEvent[] = [];
  let arrival = T0;
  for (let id = 1; ; id++) {
    arrival += -Math.log(1 - random()) * 10 * MIN;
    if (arrival > T0 + hours * HOUR) break;
    const pieces = 1 + Math.floor(random() * 12);
    const counts = { cut: 0, weeded: 0, pressed: 0, packed: 0, spoiledAt: { cut: 0, weed: 0, press: 0, pack: 0 } };
    bags.push({ id, orderId: id, stage: 'queued', pieces, counts, queuedAt: new Date(arrival).toISOString() });
    let ready = arrival;
    STATION_KINDS.forEach((work, i) => {
      const start = Math.max(ready, freeAt[work]);
      events.push({ bagId: id, stationId: i + 1, stationKind: work, kind: 'scan', quantity: 0, at: new Date(start).toISOString() });
      ready = start + pieces * minutesPerPiece[work] * MIN;
      freeAt[work] = ready;
      events.push({ bagId: id, stationId: i + 1, stationKind: work, kind: doneKind[work], quantity: pieces, at: new Date(ready).toISOString() });
    });
  }
  return { bags, events };
}

describe("floor numbers obey Little's law on a steady floor", () => {
  const { bags, events } = simulateFloor(600);
  const timelines = stageTimelines(bags, events);
  // Measure from hour 100 (the floor has filled) to hour 600.
  const window = { fromMs: T0 + 100 * HOUR, toMs: T0 + 600 * HOUR };
  const flow = systemFlow(timelines, window);

  /** Time-average WIP from the module's workInProgress, sampled every minute of the window. */
  function averageWip(): { bags: number; pieces: number; byStage: Record<BagStage, number> } {
    let first = 0;
    let samples = 0;
    const sum = { bags: 0, pieces: 0, byStage: { queued: 0, cut: 0, weeded: 0, pressed: 0, packed: 0 } };
    for (let t = window.fromMs + MIN; t <= window.toMs; t += MIN) {
      while (timelines[first].changes[0].atMs < t - 24 * HOUR) first++;
      const onFloor = [];
      for (let i = first; i < timelines.length && timelines[i].changes[0].atMs <= t; i++) {
        onFloor.push({ stage: stageAt(timelines[i], t) as BagStage, pieces: timelines[i].pieces });
      }
      const wip = workInProgress(onFloor);
      sum.bags += wip.inSystem.bags;
      sum.pieces += wip.inSystem.pieces;
      for (const stage of ['queued', 'cut', 'weeded', 'pressed'] as const) sum.byStage[stage] += wip.byStage[stage].bags;
      samples++;
    }
    const byStage = Object.fromEntries(Object.entries(sum.byStage).map(([s, v]) => [s, v / samples])) as Record<BagStage, number>;
    return { bags: sum.bags / samples, pieces: sum.pieces / samples, byStage };
  }
  const wip = averageWip();
  const longest = Math.max(...timelines.map((t) => (packedAtMs(t) ?? Infinity) - t.changes[0].atMs));

  it('has a busy floor with queues, so the check is not trivial', () => {
    expect(flow.bagsOut).toBeGreaterThan(2500);
    expect(wip.bags).toBeGreaterThan(2);
    // Pure work is 3.6 min/piece x 6.5 pieces = 0.39 h on average; waiting must add to it.
    expect(flow.averageHoursInSystem!).toBeGreaterThan(0.5);
    // The WIP sampler skips bags released over 24 h before a moment; that is sound only if every bag packs within 24 h.
    expect(longest).toBeLessThan(24 * HOUR);
  });

  it('counts average bags on the floor as bags per hour times average hours in the system, within 2%', () => {
    // Little (1961), "A Proof for the Queuing Formula: L = λW", Operations Research 9(3): L = λW.
    const lambdaW = flow.bagsPerHour! * flow.averageHoursInSystem!;
    expect(Math.abs(wip.bags - lambdaW) / wip.bags).toBeLessThan(0.02);
  });

  it('counts average pieces on the floor as pieces per hour times piece-weighted hours in the system, within 2%', () => {
    // Little (1961), Operations Research 9(3): L = λW holds for any unit counted consistently (here, pieces).
    const lambdaW = flow.piecesPerHour! * flow.pieceWeightedHoursInSystem!;
    expect(Math.abs(wip.pieces - lambdaW) / wip.pieces).toBeLessThan(0.02);
  });

  it('holds stage by stage: bags in each stage = bags per hour times average hours in that stage, within 2%', () => {
    // Little (1961), Operations Research 9(3): the law applies to any part of the system, here each stage.
    const hoursIn = averageHoursInStage(timelines, window);
    for (const stage of ['queued', 'cut', 'weeded', 'pressed'] as const) {
      const lambdaW = flow.bagsPerHour! * hoursIn[stage]!;
      expect(Math.abs(wip.byStage[stage] - lambdaW) / wip.byStage[stage]).toBeLessThan(0.02);
    }
  });
});
