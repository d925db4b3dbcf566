import 'fake-indexeddb/auto';
import { TestBed } from '@angular/core/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideRouter } from '@angular/router';
import { Session } from '../auth/session';
import type { StationEvent } from '../../shared/events-contract';
import { type OutboxRow, STATION_DB, type StationDb } from './station-db';
import { STATION_SOCKET } from './station-socket';
import { SYNC_TIMING, SyncService } from './sync-service';
import { TicketCache } from './ticket-cache';
import { FakeSocket, freshStationDb, operatorSession, until } from './station-testing';

function outboxRow(seq: number): OutboxRow {
  const event: StationEvent<'weed_done'> = {
    id: `00000000-0000-4000-8000-${String(seq).padStart(12, '0')}`,
    bagId: 1, stationId: 3, userId: 7, kind: 'weed_done', quantity: 1, clientAt: '2030-01-01T10:00:00Z', payload: {},
  };
  return { ...event, seq, state: 'pending', attempts: 0 };
}

describe('SyncService', () => {
  let db: StationDb;
  let socket: FakeSocket;
  let sync: SyncService;
  let http: HttpTestingController;
  const refresh = jest.fn();

  beforeEach(() => {
    db = freshStationDb();
    socket = new FakeSocket();
    refresh.mockReset().mockResolvedValue(undefined);
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        provideRouter([]),
        provideHttpClient(),
        provideHttpClientTesting(),
        { provide: STATION_DB, useValue: db },
        { provide: Session, useValue: operatorSession() },
        { provide: TicketCache, useValue: { refresh } },
        { provide: STATION_SOCKET, useValue: () => socket },
        { provide: SYNC_TIMING, useValue: { batchSize: 50, ackTimeoutMs: 80, backoffMs: 10, maxBackoffMs: 40 } },
      ],
    });
    sync = TestBed.inject(SyncService);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(async () => {
    sync.stop();
    await db.delete();
  });

  const states = async () => (await db.outbox.orderBy('seq').toArray()).map((row) => row.state);

  it('pushes the outbox in order, in batches of 50, and marks each acknowledged event acked', async () => {
    await db.outbox.bulkAdd(Array.from({ length: 120 }, (_, i) => outboxRow(i + 1)));

    sync.start();
    await until(async () => (await db.outbox.where('state').equals('acked').count()) === 120);

    expect(socket.pushes.map((batch) => batch.events.length)).toEqual([50, 50, 20]);
    expect(socket.pushes.flatMap((batch) => batch.events.map((e) => e.id))).toEqual(Array.from({ length: 120 }, (_, i) => outboxRow(i + 1).id));
    // The outbox's own fields never travel.
    expect(Object.keys(socket.pushes[0]!.events[0]!).sort()).toEqual(['bagId', 'clientAt', 'id', 'kind', 'payload', 'quantity', 'stationId', 'userId']);
    await until(() => refresh.mock.calls.length > 0);
  });

  it('keeps a refused event with the hub\'s reason and still sends the events behind it', async () => {
    await db.outbox.bulkAdd([outboxRow(1), outboxRow(2), outboxRow(3)]);
    socket.answer = (batch) => ({
      accepted: batch.events.filter((e) => e.id !== outboxRow(2).id).map((e) => e.id),
      duplicates: [],
      rejected: [{ id: outboxRow(2).id, error: 'Bag 2001-A has only 10 pieces.' }],
    });

    sync.start();
    await until(async () => (await db.outbox.where('state').equals('pending').count()) === 0 && (await db.outbox.where('state').equals('sent').count()) === 0);

    expect(await states()).toEqual(['acked', 'rejected', 'acked']);
    expect((await db.outbox.get(outboxRow(2).id))!.error).toBe('Bag 2001-A has only 10 pieces.');
    expect(socket.pushes).toHaveLength(1);
  });

  it('sends a batch again after a lost acknowledgement, and the hub\'s duplicates count as acked', async () => {
    await db.outbox.bulkAdd([outboxRow(1), outboxRow(2)]);
    let calls = 0;
    socket.answer = (batch) => {
      calls += 1;
      // The hub stored the first push but its answer never arrived; the replay is answered as duplicates.
      return calls === 1 ? null : { accepted: [], duplicates: batch.events.map((e) => e.id), rejected: [] };
    };

    sync.start();
    await until(async () => (await db.outbox.where('state').equals('acked').count()) === 2);

    expect(socket.pushes).toHaveLength(2);
    expect(socket.pushes[1]!.events.map((e) => e.id)).toEqual(socket.pushes[0]!.events.map((e) => e.id));
    expect(await states()).toEqual(['acked', 'acked']);
    expect((await db.outbox.get(outboxRow(1).id))!.attempts).toBe(2);
  });

  it('drains 5,000 events queued offline, in order, once the hub is reachable again', async () => {
    await db.outbox.bulkAdd(Array.from({ length: 5000 }, (_, i) => outboxRow(i + 1)));

    sync.start();
    // Two indexed counts: anyOf() walks a cursor, which fake-indexeddb runs in quadratic time while blocking every write.
    await until(async () => (await db.outbox.where('state').equals('pending').count()) + (await db.outbox.where('state').equals('sent').count()) === 0, 80_000, 250);

    const sent = socket.pushes.flatMap((batch) => batch.events.map((e) => e.id));
    expect(sent).toHaveLength(5000);
    expect(sent).toEqual(Array.from({ length: 5000 }, (_, i) => outboxRow(i + 1).id));
    // The waiting count follows the outbox through a live query, a moment after the last batch is acked.
    await until(() => sync.waitingEvents() === 0, 10_000, 50);
  }, 90_000);

  it('does not send a tap while its undo window is open', async () => {
    await db.outbox.add({ ...outboxRow(1), holdUntil: Date.now() + 150 });

    sync.start();
    await new Promise((resolve) => setTimeout(resolve, 60));
    expect(socket.pushes).toHaveLength(0);

    await until(async () => (await db.outbox.where('state').equals('acked').count()) === 1);
    expect(socket.pushes).toHaveLength(1);
  });

  it('uploads a photo only after its event is acked, and again after a failed upload', async () => {
    let release: () => void = () => undefined;
    const acked = new Promise<void>((resolve) => (release = resolve));
    socket.emit = function (this: FakeSocket, _name: string, batch, ack) {
      this.pushes.push(batch);
      void acked.then(() => ack({ accepted: batch.events.map((e) => e.id), duplicates: [], rejected: [] }));
      return this;
    } as FakeSocket['emit'];
    const row = outboxRow(1);
    await db.outbox.add(row);
    await db.photos.add({ eventId: row.id, state: 'waiting', blob: new Blob(['jpeg bytes'], { type: 'image/jpeg' }), attempts: 0 });
    const url = `/api/spoils/${row.id}/photo`;

    sync.start();
    await until(() => socket.pushes.length === 1);
    await new Promise((resolve) => setTimeout(resolve, 30));
    expect(http.match(url)).toHaveLength(0);

    release();
    let first: ReturnType<HttpTestingController['match']> = [];
    await until(() => (first = http.match(url)).length === 1);
    expect(first[0]!.request.body).toBeInstanceOf(FormData);
    expect((first[0]!.request.body as FormData).get('photo')).toBeTruthy();
    first[0]!.flush({ error: 'Disk busy.' }, { status: 503, statusText: 'Service Unavailable' });

    let second: ReturnType<HttpTestingController['match']> = [];
    await until(() => (second = http.match(url)).length === 1);
    second[0]!.flush({ stored: true });

    await until(async () => (await db.photos.count()) === 0);
  });
});
