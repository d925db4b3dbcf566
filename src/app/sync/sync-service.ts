import { DestroyRef, Injectable, InjectionToken, computed, effect, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { Router } from '@angular/router';
import Dexie, { liveQuery } from 'dexie';
import { EMPTY, type Observable, Subject, catchError, firstValueFrom, from, merge, of, timeout } from 'rxjs';
import { Session } from '../auth/session';
import type { BatchReply, StationEvent } from '../../shared/events-contract';
import { type OutboxRow, STATION_DB } from './station-db';
import { STATION_SOCKET, type StationSocket } from './station-socket';
import { TicketCache } from './ticket-cache';
import { applyToTicket } from './ticket-counts';

/** How the sync paces itself; specs shorten the waits. */
export interface SyncTiming {
  /** Events per push: small enough for a quick ack, large enough to empty a day's outbox in seconds. */
  batchSize: number;
  /** How long the hub has to acknowledge a batch before it is tried again. */
  ackTimeoutMs: number;
  /** First retry delay; doubled after each failure up to `maxBackoffMs`. */
  backoffMs: number;
  maxBackoffMs: number;
}

/** The sync's pacing: batches of 50, a 10 s acknowledgement timeout, retries from 1 s to 30 s. */
export const SYNC_TIMING = new InjectionToken<SyncTiming>('SYNC_TIMING', {
  providedIn: 'root',
  factory: () => ({ batchSize: 50, ackTimeoutMs: 10_000, backoffMs: 1000, maxBackoffMs: 30_000 }),
});

/** Acknowledged rows stay a day (a trace for the lead), then go. */
const ACKED_KEEP_MS = 24 * 60 * 60 * 1000;

/** What one drain pass ended with. */
type DrainEnd = 'empty' | 'held' | 'failed';

/** Pushes the outbox to the hub in order, uploads photos after their events, pulls changed tickets. */
@Injectable({ providedIn: 'root' })
export class SyncService {
  private readonly db = inject(STATION_DB);
  private readonly http = inject(HttpClient);
  private readonly tickets = inject(TicketCache);
  private readonly session = inject(Session);
  private readonly router = inject(Router);
  private readonly makeSocket = inject(STATION_SOCKET);
  private readonly timing = inject(SYNC_TIMING);

  private socket: StationSocket | null = null;
  private readonly socketUp = signal(false);
  private readonly hubAnsweredHttp = signal(false);
  private running: Promise<void> | null = null;
  private recovered: Promise<void> = Promise.resolve();
  /** Lowest seq that may still be pending, as far as this service knows (rows before it were taken). */
  private pendingFrom: number = Dexie.minKey as number;
  private again = false;
  private failures = 0;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private holdTimer: ReturnType<typeof setTimeout> | null = null;
  /** Emits 0 when a drain finds the outbox empty, so the tray clears in the same tick as the last answer. */
  private readonly drained = new Subject<number>();

  /** The hub can be reached (socket connected, or the last HTTP push got through). */
  readonly online = computed(() => this.socketUp() || this.hubAnsweredHttp());
  /** Events not yet acknowledged by the hub. */
  readonly waitingEvents = this.live(() => this.countWaiting(), 0, this.drained);
  /** Photos not yet stored by the hub. */
  readonly waitingPhotos = this.live(() => this.db.photos.where('state').equals('waiting').count(), 0);
  /** Events the hub refused, with its reasons; kept for a lead. */
  readonly rejected = this.live(() => this.db.outbox.where('state').equals('rejected').sortBy('seq'), [] as OutboxRow[]);
  /** When this tablet last finished a sync with the hub (ISO 8601), or null. */
  readonly lastSyncAt = this.live(async () => ((await this.db.meta.get('lastSyncAt'))?.value as string | undefined) ?? null, null as string | null);

  constructor() {
    inject(DestroyRef).onDestroy(() => this.stop());
    // Signing out ends the station's connection; the outbox stays for the next person's session.
    effect(() => {
      if (!this.session.signedIn()) this.stop();
    });
  }

  /** Connects to the hub and keeps the outbox moving; safe to call more than once. */
  start(): void {
    if (this.socket || !hasIndexedDb()) return;
    const socket = this.makeSocket();
    this.socket = socket;
    socket.on('connect', () => {
      this.socketUp.set(true);
      void this.afterConnect();
    });
    socket.on('disconnect', () => this.socketUp.set(false));
    socket.on('tickets:changed', () => void this.pull());
    this.pendingFrom = Dexie.minKey;
    // Rows left "sent" by a closed tab never got their answer: send them again (the hub reports duplicates).
    // This finishes before the first drain, or it could put back a batch that is on its way right now.
    this.recovered = this.db.outbox.where('state').equals('sent').modify({ state: 'pending' }).then(
      () => undefined,
      () => undefined, // No IndexedDB here: nothing can be waiting.
    );
    socket.connect();
    this.nudge();
  }

  /** Disconnects and stops retrying (on sign-out). */
  stop(): void {
    this.socket?.disconnect();
    this.socket = null;
    this.socketUp.set(false);
    this.clearTimers();
  }

  /** Something new is in the outbox: push it now (and again when a held row's undo window closes). */
  nudge(holdUntil?: number): void {
    if (holdUntil !== undefined) this.scheduleHold(holdUntil);
    void this.flush();
  }

  /** Pushes everything waiting, then uploads photos whose events are acknowledged. */
  flush(): Promise<void> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = (async () => {
      await this.recovered;
      do {
        this.again = false;
        try {
          const end = await this.drain();
          const photosOk = end === 'failed' ? true : await this.uploadPhotos();
          if (end === 'failed' || !photosOk) {
            this.scheduleRetry();
            break;
          }
          this.failures = 0;
          await this.prune();
        } catch (error) {
          // The local database itself failed (storage full, private mode): try again later, never crash the screen.
          console.warn('The outbox could not be read', error);
          this.scheduleRetry();
          break;
        }
      } while (this.again);
    })().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  /** The first waiting events, in the order they will be sent; for the sync tray's panel while it is open. */
  waitingList(limit = 200): Promise<OutboxRow[]> {
    return this.db.outbox.where('[state+seq]').between(['pending', Dexie.minKey], ['pending', Dexie.maxKey]).limit(limit).toArray()
      .then(async (pending) => [...(await this.db.outbox.where('state').equals('sent').sortBy('seq')), ...pending].slice(0, limit));
  }

  /** A lead drops a rejected event (and its photo); its local count change is taken back. */
  async discard(eventId: string): Promise<void> {
    await this.db.transaction('rw', this.db.outbox, this.db.tickets, this.db.photos, async () => {
      const row = await this.db.outbox.get(eventId);
      if (!row || row.state !== 'rejected') return;
      await this.db.outbox.delete(eventId);
      await this.db.photos.delete(eventId);
      await applyToTicket(this.db, row, -1);
    });
  }

  private async afterConnect(): Promise<void> {
    this.failures = 0;
    if (this.session.unconfirmed()) {
      await this.session.load();
      if (!this.session.signedIn()) {
        this.stop();
        await this.router.navigateByUrl('/station');
        return;
      }
    }
    await this.flush();
    await this.pull();
  }

  private async pull(): Promise<void> {
    try {
      await this.tickets.refresh();
    } catch {
      // The next connect or change notice pulls again; the cache keeps working meanwhile.
    }
  }

  private async drain(): Promise<DrainEnd> {
    for (;;) {
      const batch = await this.takeBatch();
      // Nothing pending and nothing in flight (only this loop sends): the tray shows 0 now, not after a re-count.
      if (batch === 'empty') this.drained.next(0);
      if (batch === 'empty' || batch === 'held') return batch;
      const ids = batch.map((row) => row.id);
      let reply: BatchReply;
      try {
        reply = await this.push(batch.map(toEvent));
      } catch {
        await this.putBack(ids);
        return 'failed';
      }
      const settled = await this.settle(ids, reply);
      if (!settled) return 'failed';
    }
  }

  /** The next rows to push, marked sent in the same transaction; or why there are none to push now. */
  private takeBatch(): Promise<OutboxRow[] | 'empty' | 'held'> {
    // One rw transaction per batch: a key-range read (no cursor walk) and one bulkPut, so a batch costs the same
    // whether 10 or 10,000 events wait behind it.
    return this.db.transaction('rw', this.db.outbox, async () => {
      // Start after the rows already taken: the front of the queue is where the acknowledged rows were, and a
      // range read that starts there walks past every one of them again (IndexedDB keeps deleted index entries a while).
      const read = () => this.db.outbox.where('[state+seq]').between(['pending', this.pendingFrom], ['pending', Dexie.maxKey]).limit(this.timing.batchSize).toArray();
      let rows = await read();
      if (!rows.length && this.pendingFrom !== Dexie.minKey) {
        // Nothing after the mark: look once from the very start before calling the outbox empty.
        this.pendingFrom = Dexie.minKey;
        rows = await read();
      }
      if (!rows.length) return 'empty';
      const now = Date.now();
      // Order matters more than speed: a row still in its undo window holds back the rows behind it.
      const heldAt = rows.findIndex((row) => row.holdUntil !== undefined && row.holdUntil > now);
      const batch = heldAt === -1 ? rows : rows.slice(0, heldAt);
      if (!batch.length) {
        this.scheduleHold(rows[0]!.holdUntil!);
        return 'held';
      }
      const sent = batch.map((row): OutboxRow => ({ ...row, state: 'sent', attempts: row.attempts + 1 }));
      await this.db.outbox.bulkPut(sent);
      this.pendingFrom = sent.at(-1)!.seq + 1;
      return sent;
    });
  }

  /** A push that got no answer: its rows go back to pending, to be sent again in the same order. */
  private async putBack(ids: string[]): Promise<void> {
    this.pendingFrom = Dexie.minKey;
    await this.db.transaction('rw', this.db.outbox, async () => {
      const rows = await this.db.outbox.bulkGet(ids);
      const stillSent = rows.filter((row): row is OutboxRow => row?.state === 'sent');
      await this.db.outbox.bulkPut(stillSent.map((row) => ({ ...row, state: 'pending' as const })));
    });
  }

  /** Marks each event of a batch by the hub's answer; false when the hub left some unanswered. */
  private async settle(ids: string[], reply: BatchReply): Promise<boolean> {
    const acked = new Set([...reply.accepted, ...reply.duplicates]);
    const refused = new Map(reply.rejected.map((r) => [r.id, r.error]));
    let unanswered = false;
    const ackedAt = Date.now();
    await this.db.transaction('rw', this.db.outbox, async () => {
      const rows = await this.db.outbox.bulkGet(ids);
      const settled: OutboxRow[] = [];
      for (const row of rows) {
        // A lead may have discarded a refused row meanwhile; nothing to mark then.
        if (!row) continue;
        if (acked.has(row.id)) settled.push({ ...row, state: 'acked', ackedAt });
        else if (refused.has(row.id)) settled.push({ ...row, state: 'rejected', error: refused.get(row.id) ?? 'The hub refused this event.' });
        else {
          unanswered = true;
          this.pendingFrom = Dexie.minKey;
          settled.push({ ...row, state: 'pending' });
        }
      }
      await this.db.outbox.bulkPut(settled);
    });
    return !unanswered;
  }

  private async push(events: StationEvent[]): Promise<BatchReply> {
    const socket = this.socket;
    if (socket?.connected) return this.pushBySocket(socket, events);
    try {
      const reply = await firstValueFrom(this.http.post<BatchReply>('/api/events', { events }).pipe(timeout(this.timing.ackTimeoutMs)));
      this.hubAnsweredHttp.set(true);
      return reply;
    } catch (error) {
      if (!(error instanceof HttpErrorResponse) || error.status === 0 || error.status === 504) this.hubAnsweredHttp.set(false);
      throw error;
    }
  }

  private pushBySocket(socket: StationSocket, events: StationEvent[]): Promise<BatchReply> {
    return new Promise<BatchReply>((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error('The hub did not acknowledge the batch in time.')), this.timing.ackTimeoutMs);
      socket.emit('events:push', { events }, (reply) => {
        clearTimeout(timer);
        if ('error' in reply) reject(new Error(reply.error));
        else resolve(reply);
      });
    });
  }

  /** Uploads waiting photos whose events the hub has; false when one must be tried again later. */
  private async uploadPhotos(): Promise<boolean> {
    const waiting = await this.db.photos.where('state').equals('waiting').toArray();
    let allDone = true;
    for (const photo of waiting) {
      const event = await this.db.outbox.get(photo.eventId);
      if (event && event.state !== 'acked') continue;
      const form = new FormData();
      form.append('photo', photo.blob, `${photo.eventId}.${photo.blob.type === 'image/png' ? 'png' : 'jpg'}`);
      try {
        await firstValueFrom(this.http.post(`/api/spoils/${encodeURIComponent(photo.eventId)}/photo`, form).pipe(timeout(60_000)));
        await this.db.photos.delete(photo.eventId);
      } catch (error) {
        allDone = false;
        await this.db.photos.update(photo.eventId, {
          attempts: photo.attempts + 1,
          error: error instanceof HttpErrorResponse ? `The hub answered ${error.status}.` : 'The upload did not finish.',
        });
      }
    }
    return allDone;
  }

  private async prune(): Promise<void> {
    const before = Date.now() - ACKED_KEEP_MS;
    // Only acked rows carry ackedAt, so the index holds exactly the rows that may go.
    const old = await this.db.outbox.where('ackedAt').below(before).primaryKeys();
    if (!old.length) return;
    const withPhotos = new Set(await this.db.photos.toCollection().primaryKeys());
    await this.db.outbox.bulkDelete(old.filter((id) => !withPhotos.has(id)));
  }

  private scheduleRetry(): void {
    if (!this.socket || this.retryTimer) return;
    this.failures += 1;
    // Back off 1 s, 2 s, 4 s ... up to 30 s, so a tablet out of reach does not flood the hub when it returns.
    const delay = Math.min(this.timing.maxBackoffMs, this.timing.backoffMs * 2 ** (this.failures - 1));
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      void this.flush();
    }, delay);
  }

  private scheduleHold(until: number): void {
    if (this.holdTimer) clearTimeout(this.holdTimer);
    this.holdTimer = setTimeout(() => {
      this.holdTimer = null;
      void this.flush();
    }, Math.max(0, until - Date.now()) + 20);
  }

  private clearTimers(): void {
    if (this.retryTimer) clearTimeout(this.retryTimer);
    if (this.holdTimer) clearTimeout(this.holdTimer);
    this.retryTimer = null;
    this.holdTimer = null;
  }

  /** Events not yet acknowledged: two indexed counts (anyOf() would count by walking a cursor over the outbox). */
  private async countWaiting(): Promise<number> {
    const [pending, sent] = await Promise.all([
      this.db.outbox.where('state').equals('pending').count(),
      this.db.outbox.where('state').equals('sent').count(),
    ]);
    return pending + sent;
  }

  private live<T>(query: () => Promise<T>, initialValue: T, also: Observable<T> = EMPTY) {
    if (!hasIndexedDb()) return signal(initialValue).asReadonly();
    // A browser without IndexedDB (private mode in some browsers) shows the starting value, not an error.
    const source: Observable<T> = merge(from(liveQuery(query)), also).pipe(catchError(() => of(initialValue)));
    return toSignal(source, { initialValue });
  }
}

/** The event as the hub's contract has it, without the outbox's own fields. */
function toEvent(row: OutboxRow): StationEvent {
  const { id, bagId, stationId, userId, kind, quantity, clientAt, payload } = row;
  return { id, bagId, stationId, userId, kind, quantity, clientAt, payload } as StationEvent;
}

/** Whether this browser gives Dwell an IndexedDB (without one, nothing can wait offline). */
function hasIndexedDb(): boolean {
  return !!Dexie.dependencies.indexedDB;
}
