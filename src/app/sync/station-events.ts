import { Injectable, inject } from '@angular/core';
import { v4 as uuidv4 } from 'uuid';
import { Session } from '../auth/session';
import type { EventPayloads, StationEvent } from '../../shared/events-contract';
import type { EventKind } from '../../shared/names';
import { type OutboxRow, STATION_DB } from './station-db';
import { applyToTicket } from './ticket-counts';
import { SyncService } from './sync-service';

/** How long a tile tap can be taken back before it is sent. */
export const UNDO_WINDOW_MS = 5_000;

/** Records station actions: the outbox row and the ticket's local change in one transaction. */
@Injectable({ providedIn: 'root' })
export class StationEvents {
  private readonly db = inject(STATION_DB);
  private readonly session = inject(Session);
  private readonly sync = inject(SyncService);

  /** Records an event now: outbox row and optimistic ticket change together, then nudges the sync. */
  record<K extends EventKind>(kind: K, bagId: number, quantity: number, payload: EventPayloads[K], options: { photo?: Blob } = {}): Promise<StationEvent<K>> {
    return this.write(kind, bagId, quantity, payload, undefined, undefined, options.photo);
  }

  /** Records an event that waits `holdMs` before it may be sent, so `undo()` can still take it back. */
  recordWithUndo<K extends EventKind>(kind: K, bagId: number, quantity: number, payload: EventPayloads[K], options: { holdMs?: number; size?: string } = {}): Promise<StationEvent<K>> {
    return this.write(kind, bagId, quantity, payload, Date.now() + (options.holdMs ?? UNDO_WINDOW_MS), options.size);
  }

  /** Takes back an event not yet sent: removes its row and its local change. False once it has gone. */
  async undo(eventId: string): Promise<boolean> {
    return this.db.transaction('rw', this.db.outbox, this.db.tickets, async () => {
      const row = await this.db.outbox.get(eventId);
      if (!row || row.state !== 'pending') return false;
      await this.db.outbox.delete(eventId);
      await applyToTicket(this.db, row, -1);
      return true;
    });
  }

  /** Lets a held event go now (the operator moved on). */
  async release(eventId: string): Promise<void> {
    await this.db.outbox.where('id').equals(eventId).modify((row) => { delete row.holdUntil; });
    this.sync.nudge();
  }

  /** Keeps a photo for an event until the hub has stored it; uploaded after the event is acknowledged. */
  async attachPhoto(eventId: string, blob: Blob): Promise<void> {
    await this.db.photos.put({ eventId, state: 'waiting', blob, attempts: 0 });
    this.sync.nudge();
  }

  private async write<K extends EventKind>(kind: K, bagId: number, quantity: number, payload: EventPayloads[K], holdUntil: number | undefined, size: string | undefined, photo?: Blob): Promise<StationEvent<K>> {
    const user = this.session.user();
    const station = this.session.station();
    if (!user || !station) throw new Error('Sign in at a station before recording work.');
    const event: StationEvent<K> = {
      id: uuidv4(),
      bagId,
      stationId: station.id,
      userId: user.id,
      kind,
      quantity,
      clientAt: new Date().toISOString(),
      payload,
    };
    // The photo goes in the same transaction as its event: a spoil is never kept without the photo taken for it.
    await this.db.transaction('rw', [this.db.outbox, this.db.tickets, this.db.meta, this.db.photos], async () => {
      const next = ((await this.db.meta.get('nextSeq'))?.value as number | undefined) ?? 1;
      await this.db.meta.put({ name: 'nextSeq', value: next + 1 });
      const row: OutboxRow = { ...(event as StationEvent), seq: next, state: 'pending', attempts: 0 };
      if (holdUntil !== undefined) row.holdUntil = holdUntil;
      if (size !== undefined) row.size = size;
      await this.db.outbox.add(row);
      await applyToTicket(this.db, row, 1);
      if (photo) await this.db.photos.add({ eventId: event.id, state: 'waiting', blob: photo, attempts: 0 });
    });
    this.sync.nudge(holdUntil);
    return event;
  }
}
