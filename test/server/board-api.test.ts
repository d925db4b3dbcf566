import request from 'supertest';
import type { BoardReply } from '../../src/shared/board-contract';
import { isoWeekdayOf, localDate } from '../../src/shared/floor/shift-window';
import { newBagToken } from '../../src/shared/intake/bag-token';
import { ISO_WEEKDAYS, workingDaysText } from '../../src/shared/shop-contract';
import type { RunningHub } from '../../server/hub';
import type { ShopSettingsRow } from '../../server/db/tables';
import { signedInDisplay } from './support/test-hub';
import { freshBag, leadCookie, operatorOn, startTestHub, stationEvent } from './events-fixtures';

// Each test first starts a fresh shift at the next whole second, so the board's shift holds only that test's
// events and every number below can be worked out by hand. The settings are put back afterwards.

const HOUR_MS = 3_600_000;
const TIME_ZONE = 'Europe/London';

let hub: RunningHub;
let lead: string;
let press: Awaited<ReturnType<typeof operatorOn>>;
let cut: Awaited<ReturnType<typeof operatorOn>>;
let saved: ShopSettingsRow;
const madeOrders: number[] = [];

beforeAll(async () => {
  hub = await startTestHub();
  lead = await leadCookie(hub.url);
  press = await operatorOn(hub.url, hub.db, 'Press 1', 0);
  cut = await operatorOn(hub.url, hub.db, 'Cut 1', 1);
  saved = (await hub.db('shop_settings').where({ id: 1 }).first())!;
});
afterAll(async () => {
  const { shift_start, shift_end, standard_cut_per_hour, standard_weed_per_hour, standard_press_per_hour, standard_pack_per_hour, time_zone, working_days } = saved;
  await hub.db('shop_settings').where({ id: 1 }).update({ shift_start, shift_end, standard_cut_per_hour, standard_weed_per_hour, standard_press_per_hour, standard_pack_per_hour, time_zone, working_days });
  // Later test files on this database should not find these invented orders open.
  if (madeOrders.length > 0) await hub.db('orders').whereIn('id', madeOrders).update({ status: 'cancelled' });
  await hub.close();
});

/** The same standard rate at every stage of work, as the shop's row keeps them. */
const standardRates = (perHour: number) => ({
  standard_cut_per_hour: perHour,
  standard_weed_per_hour: perHour,
  standard_press_per_hour: perHour,
  standard_pack_per_hour: perHour,
});

const londonClock = (at: Date) =>
  new Intl.DateTimeFormat('en-GB', { timeZone: TIME_ZONE, hour: '2-digit', minute: '2-digit', second: '2-digit', hourCycle: 'h23' }).format(at);

/**
 * Starts a shift at a whole second at least a second ahead (London wall clock) with a standard rate of 40 pieces
 * an hour at every stage, worked every day of the week (so the tests pass whatever day they run on). It runs for a day less one
 * second, so the break before it is one second and the shift opens half a second before its start: events of
 * earlier tests, all older than that, stay out of its numbers.
 */
async function freshShift(): Promise<void> {
  const start = new Date(Math.ceil((Date.now() + 1000) / 1000) * 1000);
  await hub.db('shop_settings').where({ id: 1 }).update({
    time_zone: TIME_ZONE,
    shift_start: londonClock(start),
    shift_end: londonClock(new Date(start.getTime() - 1000)),
    working_days: workingDaysText(ISO_WEEKDAYS),
    ...standardRates(40),
  });
  await new Promise((resolve) => setTimeout(resolve, start.getTime() - Date.now() + 20));
}

const board = async (cookie = lead): Promise<BoardReply> => (await request(hub.url).get('/api/board').set('Cookie', cookie).expect(200)).body;
const push = (who: { cookie: string }, events: unknown[]) => request(hub.url).post('/api/events').set('Cookie', who.cookie).send({ events }).expect(200);
const stationNamed = (reply: BoardReply, name: string) => reply.stations.find((s) => s.name === name)!;

/** A fresh bag of the seeded choir order, already cut and weeded (test setup straight in the database). */
async function weededBag(pieces: number) {
  const bag = await freshBag(hub.db, pieces);
  await hub.db('bags').where({ id: bag.id }).update({ qty_cut: pieces, qty_weeded: pieces, stage: 'weeded' });
  return bag;
}

/** An open order of one queued bag, for a seeded customer, due at the given time. */
async function orderOfOneBag(code: string, dueAt: Date, pieces: number): Promise<number> {
  const customer = (await hub.db('customers').where({ name: 'Lantern Street Café' }).first())!;
  const job = (await hub.db('jobs').where({ name: 'Choir crest' }).first())!;
  const [orderId] = await hub.db('orders').insert({ code, customer_id: customer.id, due_at: dueAt, status: 'open', notes: '' });
  await hub.db('bags').insert({ order_id: orderId!, job_id: job.id, code: `${code}-A`, token: newBagToken(), sizes: hub.db.raw('?', [JSON.stringify({ M: pieces })]) as never, pieces });
  madeOrders.push(orderId!);
  return orderId!;
}

describe('GET /api/board', () => {
  it('answers a lead and a wall display, and refuses an operator with a sentence', async () => {
    const forLead = await board();
    expect(forLead.shift).toEqual({ startAt: expect.any(String), endAt: expect.any(String) });
    expect(forLead.stations.map((s) => s.name)).toEqual(expect.arrayContaining(['Cut 1', 'Weed 1', 'Press 1', 'Pack 1']));

    const display = await signedInDisplay(hub.url);
    const forDisplay = await display.get('/api/board').expect(200);
    expect(Object.keys(forDisplay.body).sort()).toEqual(Object.keys(forLead).sort());

    const operator = await request(hub.url).get('/api/board').set('Cookie', press.cookie);
    expect(operator.status).toBe(403);
    expect(operator.body.error).toMatch(/role/);
  });

  it('moves the press station\'s shift pieces and the stage counts by exactly the pieces pressed', async () => {
    await freshShift();
    const bag = await weededBag(6);
    const before = await board();
    expect(stationNamed(before, 'Press 1').shiftPieces).toBe(0);

    const at = { bagId: bag.id, stationId: press.stationId, userId: press.userId };
    await push(press, [stationEvent(at, 'press_done', 4), stationEvent(at, 'press_done', 2)]);
    const after = await board();

    // By hand: 4 + 2 = 6 pieces pressed; the 6-piece bag leaves "weeded" and arrives in "pressed".
    const station = stationNamed(after, 'Press 1');
    expect(station.shiftPieces).toBe(6);
    expect(station.piecesPerHour).toBeCloseTo((6 * HOUR_MS) / (Date.parse(after.generatedAt) - Date.parse(after.shift.startAt)), 6);
    expect(after.stages.weeded).toEqual({ bags: before.stages.weeded.bags - 1, pieces: before.stages.weeded.pieces - 6 });
    expect(after.stages.pressed).toEqual({ bags: before.stages.pressed.bags + 1, pieces: before.stages.pressed.pieces + 6 });
    expect(after.hourly.hours).toEqual([new Date(after.shift.startAt).toISOString()]);
    expect(after.hourly.stations.find((s) => s.id === press.stationId)!.pieces).toEqual([6]);
    expect(station.lastEventAt).not.toBeNull();
  });

  it('shows a spoil in the spoil reasons and in the spoil rate and first-pass yield', async () => {
    await freshShift();
    const toCut = await freshBag(hub.db, 10);
    const weeded = await weededBag(10);
    const reason = (await hub.db('spoil_reasons').where({ label: 'Scorch or shine mark' }).first())!;

    await push(cut, [stationEvent({ bagId: toCut.id, stationId: cut.stationId, userId: cut.userId }, 'cut_done', 10)]);
    await push(press, [stationEvent({ bagId: weeded.id, stationId: press.stationId, userId: press.userId }, 'spoil', 2, { stage: 'press', reasonId: reason.id, note: 'Shine on the chest', hasPhoto: false })]);
    const reply = await board();

    // By hand: attempted = 10 cut + 0 spoiled at cut = 10; spoiled = 2; spoil rate 2 / 10 = 0.2, first-pass yield 8 / 10 = 0.8.
    expect(reply.spoilRate).toBeCloseTo(0.2, 10);
    expect(reply.firstPassYield).toBeCloseTo(0.8, 10);
    expect(reply.spoilReasons).toEqual([{ reason: 'Scorch or shine mark', pieces: 2, share: 1, cumulativeShare: 1 }]);
    expect(stationNamed(reply, 'Cut 1').shiftPieces).toBe(10);
    // A spoil is not output: the press made nothing good.
    expect(stationNamed(reply, 'Press 1').shiftPieces).toBe(0);
  });

  it('puts an order at risk when its remaining work at the standard rate ends after its due time', async () => {
    await freshShift();
    const before = await board();
    const tag = String(Math.floor(Math.random() * 1e6));
    const now = Date.now();
    const soon = await orderOfOneBag(`S${tag}`, new Date(now + 10 * 60_000), 20);
    const later = await orderOfOneBag(`L${tag}`, new Date(now + 2 * 24 * HOUR_MS), 20);
    const reply = await board();

    // By hand: a queued 20-piece bag owes 20 pieces at each of cut, weed, press and pack. Nothing was done yet this shift,
    // so every stage uses the shop's standard 40 pieces an hour: 20 / 40 = 0.5 h at each; the tie goes to the later
    // stage, pack. ETA = now + 30 min, after a due time 10 minutes away, well before one 2 days away.
    const first = reply.orders.find((o) => o.id === soon)!;
    expect(first).toMatchObject({ code: `S${tag}`, customerName: 'Lantern Street Café', atRisk: true, bottleneck: 'pack', rateSource: 'standard', remainingPieces: 20 });
    expect(Date.parse(first.etaAt!) - Date.parse(reply.generatedAt)).toBe(30 * 60_000);
    expect(reply.orders.find((o) => o.id === later)).toMatchObject({ atRisk: false, remainingPieces: 20 });

    const dues = reply.orders.map((o) => Date.parse(o.dueAt));
    expect(dues).toEqual([...dues].sort((a, b) => a - b));
    expect(reply.orders.findIndex((o) => o.id === soon)).toBeLessThan(reply.orders.findIndex((o) => o.id === later));
    // Only the order due within the shift adds to today's due pieces; takt = seconds left in the shift / pieces due.
    expect(reply.piecesDueToday - before.piecesDueToday).toBe(20);
    expect(reply.taktS).toBeCloseTo((Date.parse(reply.shift.endAt) - Date.parse(reply.generatedAt)) / 1000 / reply.piecesDueToday, 6);
  });

  it('counts an order\'s ETA in the shifts of the shop\'s working days only', async () => {
    await freshShift();
    await hub.db('shop_settings').where({ id: 1 }).update(standardRates(1));
    const tag = String(Math.floor(Math.random() * 1e6));
    const order = await orderOfOneBag(`W${tag}`, new Date(Date.now() + 3 * 24 * HOUR_MS), 30);

    // By hand: 30 pieces at the standard 1 piece an hour = 30 h at the bottleneck. Worked every day, the shift of a day
    // less one second gives about 24 h today and the rest tomorrow: ETA about 30 h away (an hour either way if the
    // clocks change), before the due time 3 days away.
    const everyDay = (await board()).orders.find((o) => o.id === order)!;
    const everyDayHours = (Date.parse(everyDay.etaAt!) - Date.now()) / HOUR_MS;
    expect(everyDayHours).toBeGreaterThan(28.9);
    expect(everyDayHours).toBeLessThan(31.1);
    expect(everyDay.atRisk).toBe(false);

    // Working only on the weekday this shift started on, the last 6 h wait a week for that weekday's next shift.
    const shiftDay = localDate(new Date((await board()).shift.startAt), TIME_ZONE);
    await hub.db('shop_settings').where({ id: 1 }).update({ working_days: String(isoWeekdayOf(shiftDay)) });
    const oneDay = (await board()).orders.find((o) => o.id === order)!;
    const oneDayHours = (Date.parse(oneDay.etaAt!) - Date.now()) / HOUR_MS;
    expect(oneDayHours).toBeGreaterThan(7 * 24 + 4.9);
    expect(oneDayHours).toBeLessThan(7 * 24 + 7.1);
    expect(oneDay.atRisk).toBe(true);
  });

  it('lists a roll below its reorder length in inches, and leaves out full and emptied rolls', async () => {
    const film = (await hub.db('films').join('film_types', 'film_types.id', 'films.film_type_id').where('film_types.name', 'Standard PU 90 µm').andWhere('films.colour', 'White').first('films.id', 'film_types.name', 'films.colour'))!;
    const tag = String(Math.floor(Math.random() * 1e6));
    const roll = (label: string, remainingMm: number, reorderMm: number) =>
      request(hub.url).post('/api/rolls').set('Cookie', lead).send({ filmId: film.id, label, widthMm: 381, lengthMm: 22_860, remainingMm, reorderMm, rackSlot: 'C9' }).expect(201);
    const low = await roll(`L${tag}`, 2_000, 2_743);
    const full = await roll(`F${tag}`, 3_000, 2_743);
    const emptied = await roll(`E${tag}`, 500, 1_000);
    await request(hub.url).post(`/api/rolls/${emptied.body.id}/measure`).set('Cookie', lead).send({ remainingMm: 0 }).expect(200);

    const reply = await board();

    // 1 in = 25.4 mm exactly (NIST SP 811, appendix B): 2,000 mm = 78.74 in -> 78.7; 2,743 mm = 107.99 in -> 108.0.
    expect(reply.lowRolls).toContainEqual({ id: low.body.id, label: `L${tag}`, film: `${film.name} ${film.colour}`, rackSlot: 'C9', remainingIn: 78.7, reorderIn: 108 });
    const ids = reply.lowRolls.map((r) => r.id);
    expect(ids).not.toContain(full.body.id);
    expect(ids).not.toContain(emptied.body.id);
  });

  it('flags an over-count from a station with the hub\'s sentence', async () => {
    const bag = await freshBag(hub.db, 5);
    const event = stationEvent({ bagId: bag.id, stationId: press.stationId, userId: press.userId }, 'press_done', 3);
    await push(press, [event]);
    const stored = (await hub.db('events').where({ id: event.id }).first())!;
    const order = (await hub.db('bags').join('orders', 'orders.id', 'bags.order_id').where('bags.id', bag.id).first('orders.code'))!;

    const reply = await board();

    // Nothing was weeded, so 3 pieces pressed is more than the stage before handed on (counting rule in src/shared/events/bag-progress.ts).
    const flag = reply.flags.find((f) => f.bagId === bag.id)!;
    expect(flag).toEqual({ kind: 'over_count', bagId: bag.id, bagCode: bag.code, orderCode: order.code, message: stored.over_count_reason, at: stored.server_at.toISOString() });
    expect(flag.message).toMatch(new RegExp(`^Over-count on bag ${bag.code}: 3 pieces were pressed or spoiled at press but only 0 were weeded`));
  });

  it('shows a station heard from over 60 seconds ago as offline and one heard from just now as online', async () => {
    const now = Date.now();
    await hub.db('stations').where({ name: 'Weed 2' }).update({ last_seen_at: new Date(now - 120_000), last_sync_at: new Date(now - 200_000) });
    await hub.db('stations').where({ name: 'Pack 1' }).update({ last_seen_at: new Date(now - 5_000), last_sync_at: null });
    await hub.db('stations').where({ name: 'Weed 1' }).update({ last_seen_at: null, last_sync_at: new Date(now - 30_000) });

    const reply = await board();

    expect(stationNamed(reply, 'Weed 2')).toMatchObject({ online: false, lastSeenAt: new Date(now - 120_000).toISOString(), lastSyncAt: new Date(now - 200_000).toISOString() });
    expect(stationNamed(reply, 'Pack 1')).toMatchObject({ online: true, lastSeenAt: new Date(now - 5_000).toISOString(), lastSyncAt: null });
    // An event batch is a sign of life too.
    expect(stationNamed(reply, 'Weed 1')).toMatchObject({ online: true, lastSeenAt: null });
  });
});
