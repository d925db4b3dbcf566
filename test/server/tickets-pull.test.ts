import request from 'supertest';
import type { TicketsReply } from '../../src/shared/events-contract';
import type { RunningHub } from '../../server/hub';
import { PressCardService } from '../../server/press/press-card-service';
import { PressRepository } from '../../server/press/press-repository';
import { freshBag, leadCookie, operatorOn, startTestHub, stationEvent } from './events-fixtures';

let hub: RunningHub;

beforeAll(async () => {
  hub = await startTestHub();
});
afterAll(() => hub.close());

const pull = (cookie: string, since: number) => request(hub.url).get(`/api/tickets?since=${since}`).set('Cookie', cookie);
const push = (cookie: string, events: unknown[]) => request(hub.url).post('/api/events').set('Cookie', cookie).send({ events });

describe('pulling station tickets', () => {
  it('gives a press station the bags changed since its last pull, each with the press card for its press', async () => {
    const press = await operatorOn(hub.url, hub.db, 'Press 1', 0);
    const cut = await operatorOn(hub.url, hub.db, 'Cut 1', 1);
    const first = (await pull(press.cookie, 0).expect(200)).body as TicketsReply;
    expect(first.version).toBeGreaterThan(0);

    const bag = await freshBag(hub.db, 5);
    await push(cut.cookie, [stationEvent({ bagId: bag.id, stationId: cut.stationId, userId: cut.userId }, 'cut_done', 5)]).expect(200);
    const next = (await pull(press.cookie, first.version).expect(200)).body as TicketsReply;

    const ticket = next.tickets.find((t) => t.bag.id === bag.id);
    expect(ticket).toBeDefined();
    expect(ticket!.bag.counts.cut).toBe(5);
    expect(ticket!.version).toBeGreaterThan(first.version);
    expect(ticket!.order.code).toEqual(expect.any(String));
    // The card must be the one the press-card service makes for this bag on Press 1's press.
    const expected = await new PressCardService(new PressRepository(hub.db)).forBag(bag.id, press.pressId!);
    expect(ticket!.pressCard).toEqual(expected);
    expect(ticket!.pressCardProblem).toBeNull();
    expect(next.version).toBeGreaterThanOrEqual(ticket!.version);
  });

  it('names packed bags and bags of cancelled orders as closed, and leaves uncut bags off weed stations', async () => {
    const weed = await operatorOn(hub.url, hub.db, 'Weed 2', 2);
    const pack = await operatorOn(hub.url, hub.db, 'Pack 1', 3);
    const since = ((await pull(weed.cookie, 0).expect(200)).body as TicketsReply).version;
    const uncut = await freshBag(hub.db, 2);
    const packed = await freshBag(hub.db, 2);
    await hub.db('bags').where({ id: packed.id }).update({ qty_cut: 2, qty_weeded: 2, qty_pressed: 2 });
    await push(pack.cookie, [stationEvent({ bagId: packed.id, stationId: pack.stationId, userId: pack.userId }, 'pack_done', 2)]).expect(200);

    const reply = (await pull(weed.cookie, since).expect(200)).body as TicketsReply;
    expect(reply.tickets.map((t) => t.bag.id)).not.toContain(uncut.id);
    expect(reply.tickets.map((t) => t.bag.id)).not.toContain(packed.id);
    expect(reply.closedBagIds).toEqual(expect.arrayContaining([uncut.id, packed.id]));
    expect(reply.tickets.every((t) => t.pressCard === null && t.pressCardProblem === null)).toBe(true);
  });

  it('finds one bag by the token on its label for a lead and a station', async () => {
    const press = await operatorOn(hub.url, hub.db, 'Press 2', 0);
    const bag = await freshBag(hub.db, 3);
    const asStation = await request(hub.url).get(`/api/tickets/by-token/${bag.token}`).set('Cookie', press.cookie).expect(200);
    expect(asStation.body.bag.id).toBe(bag.id);
    expect(asStation.body.version).toBeGreaterThan(0);
    expect(asStation.body.pressCard ?? asStation.body.pressCardProblem).toBeTruthy();
    const asLead = await request(hub.url).get(`/api/tickets/by-token/${bag.token}`).set('Cookie', await leadCookie(hub.url)).expect(200);
    expect(asLead.body).toMatchObject({ bag: { id: bag.id }, pressCard: null, pressCardProblem: null });
  });

  it('carries the pieces spoiled at each stage on the pulled ticket, the scanned ticket and the order detail', async () => {
    const press = await operatorOn(hub.url, hub.db, 'Press 2', 2);
    const pack = await operatorOn(hub.url, hub.db, 'Pack 1', 3);
    const since = ((await pull(pack.cookie, 0).expect(200)).body as TicketsReply).version;
    const reason = (await hub.db('spoil_reasons').where({ active: true }).first())!;
    const bag = await freshBag(hub.db, 4);
    const clean = await freshBag(hub.db, 2);
    await hub.db('bags').where({ id: bag.id }).update({ qty_cut: 4, qty_weeded: 4 });
    const atPress = { bagId: bag.id, stationId: press.stationId, userId: press.userId };
    const atPack = { bagId: bag.id, stationId: pack.stationId, userId: pack.userId };
    const spoil = (at: typeof atPress, stage: string) => stationEvent(at, 'spoil', 1, { stage, reasonId: reason.id, note: '', hasPhoto: false });
    // Two spoil events at the press (1 + 1) are summed; the one at the pack bench is kept apart from them.
    const pressed = await push(press.cookie, [stationEvent(atPress, 'press_done', 2), spoil(atPress, 'press'), spoil(atPress, 'press')]).expect(200);
    expect(pressed.body.rejected).toEqual([]);
    expect((await push(pack.cookie, [spoil(atPack, 'pack')]).expect(200)).body.rejected).toEqual([]);
    const expected = { spoiled: 3, spoiledAt: { cut: 0, weed: 0, press: 2, pack: 1 } };

    const pulled = ((await pull(pack.cookie, since).expect(200)).body as TicketsReply).tickets.find((t) => t.bag.id === bag.id);
    expect(pulled!.bag.counts).toMatchObject(expected);
    const scanned = await request(hub.url).get(`/api/tickets/by-token/${bag.token}`).set('Cookie', pack.cookie).expect(200);
    expect(scanned.body.bag.counts).toMatchObject(expected);
    const orderId = (await hub.db('bags').where({ id: bag.id }).first('order_id'))!.order_id;
    const order = await request(hub.url).get(`/api/orders/${orderId}`).set('Cookie', await leadCookie(hub.url)).expect(200);
    const inOrder = (id: number) => (order.body.bags as { id: number; counts: object }[]).find((b) => b.id === id)!.counts;
    expect(inOrder(bag.id)).toMatchObject(expected);
    // A bag with no spoils answers zeros at every stage, not a missing field.
    expect(inOrder(clean.id)).toMatchObject({ spoiled: 0, spoiledAt: { cut: 0, weed: 0, press: 0, pack: 0 } });
  });

  it('refuses a since that is not a whole number with a sentence', async () => {
    const press = await operatorOn(hub.url, hub.db, 'Press 1', 1);
    const res = await pull(press.cookie, 'soon' as never).expect(400);
    expect(res.body.error).toMatch(/since/);
  });
});
