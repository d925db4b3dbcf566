import { randomUUID } from 'node:crypto';
import type { Knex } from 'knex';
import { stageOf } from '../src/shared/events/bag-progress';
import { addDays, localDate, shiftOnDay } from '../src/shared/floor/shift-window';
import type { EventKind, StationKind } from '../src/shared/names';

const MINUTE_MS = 60 * 1000;
const HOUR_MS = 60 * MINUTE_MS;

/** Pieces spoiled on a demo bag; seeds/05_orders.ts already counts their remakes in the bag's done pieces. */
const SPOILS: { bag: string; stage: StationKind; reason: string; quantity: number; note: string; minutesBeforeEnd: number }[] = [
  { bag: '1043-A', stage: 'press', reason: 'Film lifted after peel', quantity: 2, note: 'Edges of the 5K lettering lifted on two tees.', minutesBeforeEnd: 70 },
  { bag: '1042-A', stage: 'weed', reason: 'Torn while weeding', quantity: 1, note: '', minutesBeforeEnd: 95 },
  { bag: '1041-A', stage: 'cut', reason: 'Cut incomplete', quantity: 1, note: 'Blade skipped on the number 7.', minutesBeforeEnd: 150 },
];

const DONE_KIND: Record<StationKind, EventKind> = { cut: 'cut_done', weed: 'weed_done', press: 'press_done', pack: 'pack_done' };
const COUNT_COLUMN = { cut: 'qty_cut', weed: 'qty_weeded', press: 'qty_pressed', pack: 'qty_packed' } as const;

/** A span of epoch milliseconds. */
interface Span {
  from: number;
  to: number;
}

/**
 * The last three working hours before now inside the shop's shift (the one running, or the last one
 * if it has ended or has barely begun), and the shift before that for orders already ready, so the
 * board opens on a shift with work in it whatever time the demo is seeded.
 */
function workWindows(now: number, zone: string, start: string, end: string): { open: Span; ready: Span } {
  const today = localDate(new Date(now), zone);
  const shiftOn = (offset: number) => shiftOnDay(addDays(today, offset), zone, start, end);
  // The latest shift that has been running for an hour, and the one before it.
  const offset = Date.parse(shiftOn(0).startAt) <= now - HOUR_MS ? 0 : -1;
  const endOf = (s: { endAt: string }) => Math.min(now, Date.parse(s.endAt)) - 5 * MINUTE_MS;
  const span = (s: { startAt: string; endAt: string }) => ({ from: Math.max(Date.parse(s.startAt), endOf(s) - 3 * HOUR_MS), to: endOf(s) });
  return { open: span(shiftOn(offset)), ready: span(shiftOn(offset - 1)) };
}

/** Splits pieces into batches of about six, as an operator reports them. */
function batches(pieces: number): number[] {
  const out: number[] = [];
  for (let left = pieces; left > 0; left -= 6) out.push(Math.min(6, left));
  return out;
}

/**
 * Station events behind the demo bags' counts, so the floor board and reports have a shift to show:
 * every good piece a bag has passed becomes a done event at a station of that kind, stage after stage
 * across the bag's work window (the last working hours of the shift), and a few spoils (with their remakes) give the spoil ranking something to rank.
 */
export async function seed(knex: Knex): Promise<void> {
  const now = Date.now();
  const shop = (await knex('shop_settings').first('time_zone', 'shift_start', 'shift_end'))!;
  const windows = workWindows(now, shop.time_zone, shop.shift_start, shop.shift_end);
  const stations = await knex('stations').select('id', 'kind').orderBy('id');
  const operators = (await knex('users').where({ role: 'operator', active: true }).orderBy('id').pluck('id')) as number[];
  const reasons = new Map((await knex('spoil_reasons').select('id', 'label')).map((r) => [r.label as string, r.id as number]));
  const bags = await knex('bags').join('orders', 'orders.id', 'bags.order_id').select('bags.*', 'orders.status as order_status').orderBy('bags.id');

  const rows: Record<string, unknown>[] = [];
  const stationFor = (kind: StationKind, n: number) => {
    const ofKind = stations.filter((s) => s.kind === kind);
    return ofKind[n % ofKind.length]!.id as number;
  };
  for (const [b, bag] of bags.entries()) {
    const window = bag.order_status === 'open' ? windows.open : windows.ready;
    (['cut', 'weed', 'press', 'pack'] as StationKind[]).forEach((kind, k) => {
      const parts = batches(bag[COUNT_COLUMN[kind]] as number);
      parts.forEach((quantity, i) => {
        // Stage k of the bag happens in the k-th quarter of its window, batches spread inside it.
        const at = new Date(window.from + ((window.to - window.from) * (k + (i + 1) / (parts.length + 1))) / 4);
        rows.push({
          id: randomUUID(),
          bag_id: bag.id,
          station_id: stationFor(kind, b),
          user_id: operators[(b + k) % operators.length],
          kind: DONE_KIND[kind],
          quantity,
          client_at: at,
          server_at: at,
          payload: knex.raw('?', ['{}']),
        });
      });
    });
  }
  if (rows.length > 0) await knex('events').insert(rows);

  for (const spoil of SPOILS) {
    const bag = bags.find((row) => row.code === spoil.bag)!;
    const at = new Date(Math.max(windows.open.from, windows.open.to - spoil.minutesBeforeEnd * MINUTE_MS));
    const id = randomUUID();
    const reasonId = reasons.get(spoil.reason)!;
    await knex('events').insert({
      id,
      bag_id: bag.id,
      station_id: stationFor(spoil.stage, 0),
      user_id: operators[0],
      kind: 'spoil',
      quantity: spoil.quantity,
      client_at: at,
      server_at: at,
      payload: knex.raw('?', [JSON.stringify({ stage: spoil.stage, reasonId, note: spoil.note, hasPhoto: false })]),
    });
    await knex('spoils').insert({ event_id: id, bag_id: bag.id, stage: spoil.stage, reason_id: reasonId, quantity: spoil.quantity, note: spoil.note, created_at: at });
    const spoiledAt = { cut: 0, weed: 0, press: 0, pack: 0, [spoil.stage]: spoil.quantity };
    await knex('bags')
      .where({ id: bag.id })
      .update({
        qty_spoiled: spoil.quantity,
        remake_count: spoil.quantity,
        stage: stageOf({ pieces: bag.pieces, cut: bag.qty_cut, weeded: bag.qty_weeded, pressed: bag.qty_pressed, packed: bag.qty_packed, spoiledAt }),
      });
  }
}
