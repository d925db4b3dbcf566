import request from 'supertest';
import type { BatchReply, BoardUpdate } from '../../src/shared/events-contract';
import type { RunningHub } from '../../server/hub';
import { freshBag, leadCookie, openSocket, operatorOn, startTestHub, stationEvent, type ClientSocket } from './events-fixtures';

// Expected counts below follow the stage and remake rules in server/events/bag-progress.ts
// (common practice, no published source): done events count good pieces, a spoil is one remake.

let hub: RunningHub;
const sockets: ClientSocket[] = [];
let press: Awaited<ReturnType<typeof operatorOn>>;
let weed: Awaited<ReturnType<typeof operatorOn>>;

beforeAll(async () => {
  hub = await startTestHub();
  press = await operatorOn(hub.url, hub.db, 'Press 1', 0);
  weed = await operatorOn(hub.url, hub.db, 'Weed 1', 1);
});
afterAll(async () => {
  sockets.forEach((socket) => socket.disconnect());
  await hub.close();
});

const push = (cookie: string, events: unknown[]) => request(hub.url).post('/api/events').set('Cookie', cookie).send({ events });
const bagRow = async (id: number) => (await hub.db('bags').where({ id }).first())!;

describe('pushing station events', () => {
  it('counts a batch replayed three times once and answers the replays as duplicates', async () => {
    const bag = await freshBag(hub.db, 10);
    const at = { bagId: bag.id, stationId: weed.stationId, userId: weed.userId };
    const batch = [stationEvent(at, 'scan', 0), stationEvent(at, 'weed_done', 6), stationEvent(at, 'weed_done', 4)];

    const first = await push(weed.cookie, batch).expect(200);
    const second = await push(weed.cookie, batch).expect(200);
    const third = await push(weed.cookie, batch).expect(200);

    const ids = batch.map((event) => event.id);
    expect(first.body).toEqual({ accepted: ids, duplicates: [], rejected: [] });
    expect(second.body).toEqual({ accepted: [], duplicates: ids, rejected: [] });
    expect(third.body).toEqual({ accepted: [], duplicates: ids, rejected: [] });
    expect((await bagRow(bag.id)).qty_weeded).toBe(10);
    expect(await hub.db('events').whereIn('id', ids).count({ n: '*' }).first()).toEqual({ n: 3 });
  });

  it('accepts the good events of a batch in order and names the bad one with a sentence', async () => {
    const bag = await freshBag(hub.db, 10);
    const at = { bagId: bag.id, stationId: press.stationId, userId: press.userId };
    const good1 = stationEvent(at, 'press_done', 3);
    const bad = { ...stationEvent(at, 'press_done', 2), quantity: 2.5 };
    const good2 = stationEvent(at, 'press_done', 4);

    const res = await push(press.cookie, [good1, bad, good2]).expect(200);

    expect(res.body.accepted).toEqual([good1.id, good2.id]);
    expect(res.body.rejected).toEqual([{ id: bad.id, error: expect.stringMatching(/quantity.*whole number/) }]);
    const stored = await hub.db('events').where({ bag_id: bag.id }).orderBy('seq').pluck('id');
    expect(stored).toEqual([good1.id, good2.id]);
    expect((await bagRow(bag.id)).qty_pressed).toBe(7);
  });

  it('rejects an event for another station, a kind the station does not do and another operator, each with a sentence', async () => {
    const bag = await freshBag(hub.db, 5);
    const mine = { bagId: bag.id, stationId: weed.stationId, userId: weed.userId };
    const otherStation = stationEvent({ ...mine, stationId: press.stationId }, 'press_done', 1);
    const wrongKind = stationEvent(mine, 'press_done', 1);
    const otherUser = stationEvent({ ...mine, userId: press.userId }, 'weed_done', 1);
    const future = { ...stationEvent(mine, 'weed_done', 1), clientAt: new Date(Date.now() + 60 * 60 * 1000).toISOString() };
    const noBag = stationEvent({ ...mine, bagId: 99_999_999 }, 'weed_done', 1);

    const res = await push(weed.cookie, [otherStation, wrongKind, otherUser, future, noBag]).expect(200);

    const errors = Object.fromEntries((res.body as BatchReply).rejected.map((r) => [r.id, r.error]));
    expect(errors[otherStation.id]).toMatch(/signed in at Weed 1/);
    expect(errors[wrongKind.id]).toMatch(/A weed station cannot report press_done/);
    expect(errors[otherUser.id]).toMatch(/another operator/);
    expect(errors[future.id]).toMatch(/ahead of the hub's clock/);
    expect(errors[noBag.id]).toMatch(/There is no bag/);
    expect(res.body.accepted).toEqual([]);
    expect(await bagRow(bag.id)).toMatchObject({ qty_weeded: 0, qty_pressed: 0 });
  });

  it('refuses station events from a lead, who has no station', async () => {
    const bag = await freshBag(hub.db, 5);
    const res = await push(await leadCookie(hub.url), [stationEvent({ bagId: bag.id, stationId: press.stationId, userId: 1 }, 'press_done', 1)]);
    expect(res.status).toBe(403);
  });

  it('accepts an over-count from two tablets on one bag and flags the bag with the reason', async () => {
    const bag = await freshBag(hub.db, 4);
    const second = await operatorOn(hub.url, hub.db, 'Press 2', 2);
    await hub.db('bags').where({ id: bag.id }).update({ qty_cut: 4 });
    await push(weed.cookie, [stationEvent({ bagId: bag.id, stationId: weed.stationId, userId: weed.userId }, 'weed_done', 4)]).expect(200);
    const a = stationEvent({ bagId: bag.id, stationId: press.stationId, userId: press.userId }, 'press_done', 4);
    const b = stationEvent({ bagId: bag.id, stationId: second.stationId, userId: second.userId }, 'press_done', 4);

    expect((await push(press.cookie, [a]).expect(200)).body.accepted).toEqual([a.id]);
    expect((await bagRow(bag.id)).over_count).toBe(0);
    expect((await push(second.cookie, [b]).expect(200)).body.accepted).toEqual([b.id]);

    const stored = await bagRow(bag.id);
    expect(stored).toMatchObject({ qty_pressed: 8, over_count: 1 });
    const flagged = await hub.db('events').where({ id: b.id }).first();
    expect(flagged!.over_count_reason).toMatch(/8 pieces were pressed but the bag owes 4/);
    expect(flagged!.over_count_reason).toMatch(/Press 1 also reported press_done/);
  });

  it('counts a spoil as a remake, keeps the spoil row and moves the stage by what each stage owes', async () => {
    const bag = await freshBag(hub.db, 3);
    const reason = (await hub.db('spoil_reasons').where({ active: true }).first())!;
    const at = { bagId: bag.id, stationId: press.stationId, userId: press.userId };
    const cut = await operatorOn(hub.url, hub.db, 'Cut 1', 3);
    const atCut = { bagId: bag.id, stationId: cut.stationId, userId: cut.userId };
    await push(cut.cookie, [stationEvent(atCut, 'cut_done', 3)]).expect(200);
    await push(weed.cookie, [stationEvent({ bagId: bag.id, stationId: weed.stationId, userId: weed.userId }, 'weed_done', 3)]).expect(200);
    expect((await bagRow(bag.id)).stage).toBe('weeded');

    const spoil = stationEvent(at, 'spoil', 1, { stage: 'press', reasonId: reason.id, note: 'Scorched', hasPhoto: false });
    expect((await push(press.cookie, [stationEvent(at, 'press_done', 2), spoil]).expect(200)).body.rejected).toEqual([]);
    // One piece spoiled at the press: cut and weed owe 4 now, so the bag waits for the remake to be cut.
    expect(await bagRow(bag.id)).toMatchObject({ qty_pressed: 2, qty_spoiled: 1, remake_count: 1, stage: 'queued', over_count: 0 });
    expect(await hub.db('spoils').where({ event_id: spoil.id }).first()).toMatchObject({ stage: 'press', quantity: 1, note: 'Scorched' });

    await push(cut.cookie, [stationEvent(atCut, 'cut_done', 1)]).expect(200);
    await push(weed.cookie, [stationEvent({ bagId: bag.id, stationId: weed.stationId, userId: weed.userId }, 'weed_done', 1)]).expect(200);
    await push(press.cookie, [stationEvent(at, 'press_done', 1)]).expect(200);
    expect(await bagRow(bag.id)).toMatchObject({ qty_cut: 4, qty_weeded: 4, qty_pressed: 3, stage: 'pressed', over_count: 0 });
  });

  it('rejects a spoil with an inactive reason', async () => {
    const bag = await freshBag(hub.db, 3);
    const [reasonId] = await hub.db('spoil_reasons').insert({ label: `Retired ${Date.now()}`, position: 999, active: false });
    const spoil = stationEvent({ bagId: bag.id, stationId: press.stationId, userId: press.userId }, 'spoil', 1, { stage: 'press', reasonId, note: '', hasPhoto: false });
    const res = await push(press.cookie, [spoil]).expect(200);
    expect(res.body.rejected).toEqual([{ id: spoil.id, error: expect.stringMatching(/spoil reason is not on the list/) }]);
  });

  it('acknowledges a socket push and sends one board update to a signed-in lead', async () => {
    const bag = await freshBag(hub.db, 6);
    const lead = await openSocket(hub.url, await leadCookie(hub.url), sockets);
    const tablet = await openSocket(hub.url, press.cookie, sockets);
    const updates: BoardUpdate[] = [];
    const firstUpdate = new Promise<void>((resolve) => lead.on('board:update', (update) => resolve(void updates.push(update))));
    const changed = new Promise<{ bagIds: number[]; version: number }>((resolve) => tablet.on('tickets:changed', resolve));
    const at = { bagId: bag.id, stationId: press.stationId, userId: press.userId };

    const reply = await tablet.timeout(10_000).emitWithAck('events:push', { events: [stationEvent(at, 'press_done', 2), stationEvent(at, 'press_done', 1)] });

    expect(reply).toMatchObject({ duplicates: [], rejected: [] });
    expect((reply as BatchReply).accepted).toHaveLength(2);
    const change = await changed;
    expect(change.bagIds).toEqual([bag.id]);
    expect(change.version).toBe(Number((await bagRow(bag.id)).version));
    await firstUpdate;
    // One batch is one board update: a second one would have arrived by now.
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(updates).toEqual([{ bagIds: [bag.id], at: expect.any(String) }]);
    const station = await hub.db('stations').where({ id: press.stationId }).first();
    expect(station!.last_sync_at).toBeInstanceOf(Date);
  });

  it('answers a malformed socket batch with an error sentence', async () => {
    const tablet = await openSocket(hub.url, press.cookie, sockets);
    const reply = await tablet.timeout(5000).emitWithAck('events:push', { nope: true } as never);
    expect(reply).toEqual({ error: expect.stringMatching(/The batch is not valid/) });
  });
});

describe('counting from an offline tablet that was behind', () => {
  it('flags more pressed than weeded, and clears the bag flag once the late weed count arrives', async () => {
    const hubBag = await freshBag(hub.db, 2);
    await hub.db('bags').where({ id: hubBag.id }).update({ qty_cut: 2 });
    const pressed = stationEvent({ bagId: hubBag.id, stationId: press.stationId, userId: press.userId }, 'press_done', 2);
    await push(press.cookie, [pressed]).expect(200);
    expect((await bagRow(hubBag.id)).over_count).toBe(1);
    expect((await hub.db('events').where({ id: pressed.id }).first())!.over_count_reason).toMatch(/2 pieces were pressed or spoiled at press but only 0 were weeded/);

    await push(weed.cookie, [stationEvent({ bagId: hubBag.id, stationId: weed.stationId, userId: weed.userId }, 'weed_done', 2)]).expect(200);
    expect(await bagRow(hubBag.id)).toMatchObject({ over_count: 0, stage: 'pressed' });
    expect((await hub.db('events').where({ id: pressed.id }).first())!.over_count_reason).not.toBeNull();
  });
});
