import 'fake-indexeddb/auto';
import { TestBed } from '@angular/core/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { Session } from '../auth/session';
import { STATION_DB, type StationDb } from './station-db';
import { StationEvents } from './station-events';
import { SyncService } from './sync-service';
import { cacheTicket, freshStationDb, operatorSession, plainTicket } from './station-testing';

describe('StationEvents', () => {
  let db: StationDb;
  let events: StationEvents;
  const nudge = jest.fn();

  beforeEach(async () => {
    db = freshStationDb();
    nudge.mockReset();
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        { provide: STATION_DB, useValue: db },
        { provide: Session, useValue: operatorSession() },
        { provide: SyncService, useValue: { nudge } },
      ],
    });
    events = TestBed.inject(StationEvents);
    await cacheTicket(db, plainTicket(1, { S: 4, M: 6 }));
  });

  afterEach(() => db.delete());

  it('writes the outbox row and the bag\'s new count together, then nudges the sync', async () => {
    const event = await events.record('weed_done', 1, 3, {});

    const row = await db.outbox.get(event.id);
    expect(row).toMatchObject({ kind: 'weed_done', bagId: 1, quantity: 3, stationId: 3, userId: 7, state: 'pending', attempts: 0, seq: 1 });
    expect(event.id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    expect((await db.tickets.get(1))!.ticket.bag.counts.weeded).toBe(3);
    expect(nudge).toHaveBeenCalled();
  });

  it('numbers events in the order they were made', async () => {
    const first = await events.record('scan', 1, 0, {});
    const second = await events.record('weed_done', 1, 1, {});
    expect((await db.outbox.get(first.id))!.seq).toBeLessThan((await db.outbox.get(second.id))!.seq);
  });

  it('leaves neither the outbox row nor the count when the transaction aborts', async () => {
    // The ticket write fails inside the transaction, so the outbox row written before it must go too.
    const put = jest.spyOn(db.tickets, 'put').mockImplementation(() => Promise.reject(new Error('disk full')) as never);

    await expect(events.record('weed_done', 1, 2, {})).rejects.toThrow('disk full');
    put.mockRestore();

    expect(await db.outbox.count()).toBe(0);
    expect((await db.tickets.get(1))!.ticket.bag.counts.weeded).toBe(0);
  });

  it('takes back an event still in its undo window, row and count together', async () => {
    const event = await events.recordWithUndo('weed_done', 1, 1, {}, { size: 'M' });
    expect((await db.tickets.get(1))!.local.weededBySize['M']).toBe(1);

    expect(await events.undo(event.id)).toBe(true);

    expect(await db.outbox.count()).toBe(0);
    const row = (await db.tickets.get(1))!;
    expect(row.ticket.bag.counts.weeded).toBe(0);
    expect(row.local.weededBySize['M']).toBe(0);
  });

  it('refuses to undo an event that has already been sent', async () => {
    const event = await events.recordWithUndo('weed_done', 1, 1, {});
    await db.outbox.update(event.id, { state: 'sent' });
    expect(await events.undo(event.id)).toBe(false);
    expect(await db.outbox.count()).toBe(1);
  });

  it('adds a spoil to the bag\'s spoiled and remake counts and to the spoils of its stage', async () => {
    await events.record('spoil', 1, 2, { stage: 'weed', reasonId: 5, note: '', hasPhoto: false });
    const bag = (await db.tickets.get(1))!.ticket.bag;
    expect(bag.counts.spoiled).toBe(2);
    expect(bag.counts.spoiledAt).toEqual({ cut: 0, weed: 2, press: 0, pack: 0 });
    expect(bag.remakeCount).toBe(2);
  });

  it('takes an undone spoil back off the spoils of its stage', async () => {
    const event = await events.recordWithUndo('spoil', 1, 3, { stage: 'press', reasonId: 5, note: '', hasPhoto: false });
    expect((await db.tickets.get(1))!.ticket.bag.counts.spoiledAt.press).toBe(3);

    expect(await events.undo(event.id)).toBe(true);

    const bag = (await db.tickets.get(1))!.ticket.bag;
    expect(bag.counts.spoiledAt).toEqual({ cut: 0, weed: 0, press: 0, pack: 0 });
    expect(bag.counts.spoiled).toBe(0);
  });
});
