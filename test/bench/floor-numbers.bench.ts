// The floor board's numbers for a busy shift, as the hub computes them on every board:update:
// median time of floorNumbers() next to one plain pass over the same events (the least any board
// computation must do) as the same-run baseline, and the size of the numbers as JSON, at two floor sizes.
import { floorNumbers, type FloorInput } from '../../src/shared/floor/floor-numbers';
import type { FloorBag, FloorEvent, FloorOrder, FloorStation } from '../../src/shared/floor/floor-types';
import { STATION_KINDS, type EventKind } from '../../src/shared/names';
import { medianMs } from './median-time';

const RUNS = 9;
const SHIFT = { startAt: '2026-03-02T07:00:00.000Z', endAt: '2026-03-02T15:30:00.000Z', now: '2026-03-02T14:00:00.000Z' };
const DONE: Record<(typeof STATION_KINDS)[number], EventKind> = { cut: 'cut_done', weed: 'weed_done', press: 'press_done', pack: 'pack_done' };

// An invented floor: orders of 4 bags of 24 pieces, each bag part-way through its stages.
function busyFloor(orderCount: number, eventsPerBag: number): FloorInput {
  const stations: FloorStation[] = STATION_KINDS.flatMap((kind, k) => [1, 2, 3].map((n) => ({ id: k * 3 + n, kind, name: `${kind} ${n}` })));
  const orders: FloorOrder[] = Array.from({ length: orderCount }, (_, i) => ({ id: i + 1, code: String(2000 + i), dueAt: new Date(Date.parse(SHIFT.now) + (i % 48) * 3_600_000).toISOString() }));
  const bags: FloorBag[] = [];
  const events: FloorEvent[] = [];
  const startMs = Date.parse(SHIFT.startAt);
  const spanMs = Date.parse(SHIFT.now) - startMs;
  for (const order of orders) {
    for (let b = 0; b < 4; b++) {
      const id = bags.length + 1;
      const done = (id * 7) % 25;
      bags.push({ id, orderId: order.id, stage: 'cut', pieces: 24, counts: { cut: 24, weeded: done, pressed: Math.floor(done / 2), packed: 0, spoiledAt: { cut: 0, weed: 0, press: 0, pack: 0 } }, queuedAt: SHIFT.startAt });
      for (let e = 0; e < eventsPerBag; e++) {
        const kind = STATION_KINDS[e % 4];
        const spoil = e % 23 === 0;
        events.push({ bagId: id, stationId: (STATION_KINDS.indexOf(kind) * 3) + 1 + (id % 3), stationKind: kind, kind: spoil ? 'spoil' : DONE[kind], quantity: spoil ? 1 : 2, at: new Date(startMs + ((id * 131 + e * 977) % spanMs)).toISOString() });
      }
    }
  }
  const spoils = events.filter((e) => e.kind === 'spoil').map((e, i) => ({ reason: ['Film lifted after peel', 'Placed crooked', 'Torn while weeding'][i % 3]!, quantity: e.quantity }));
  return { stations, events, bags, orders, spoils, shift: SHIFT, standardRates: { cut: 40, weed: 40, press: 40, pack: 40 } };
}

// The baseline's sum is printed at the end, so the engine cannot skip the loop as dead code.
let sink = 0;
const rows = [
  { floor: 'small shop (40 orders, 160 bags)', input: busyFloor(40, 20) },
  { floor: 'large shop (400 orders, 1,600 bags)', input: busyFloor(400, 20) },
].map(({ floor, input }) => {
  const baselineMs = medianMs(() => {
    for (const e of input.events) sink += e.quantity + (Date.parse(e.at) % 2);
  }, RUNS);
  const numbers = floorNumbers(input);
  const boardMs = medianMs(() => floorNumbers(input), RUNS);
  return {
    floor,
    events: input.events.length,
    boardMedianMs: +boardMs.toFixed(1),
    baselineMedianMs: +baselineMs.toFixed(2),
    boardVsBaseline: +(boardMs / baselineMs).toFixed(1),
    numbersJsonKb: Math.round(JSON.stringify(numbers).length / 1024),
    ordersAtRisk: numbers.orders.filter((o) => o.atRisk).length,
  };
});

console.log(`runs: ${RUNS}; baseline: one pass over the events reading each quantity and time`);
console.table(rows);
console.log(`(baseline checksum ${sink})`);
