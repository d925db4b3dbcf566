import { InjectionToken } from '@angular/core';
import Dexie, { type EntityTable } from 'dexie';
import type { SpoilReason, StationEvent, StationTicket } from '../../shared/events-contract';
import type { Size } from '../../shared/intake-contract';

/** Where an outbox row is on its way to the hub. */
export type OutboxState = 'pending' | 'sent' | 'acked' | 'rejected';

/** One station event waiting for (or given) the hub's acknowledgement. */
export interface OutboxRow extends StationEvent {
  /** Local increasing number: the order the hub receives events in. */
  seq: number;
  state: OutboxState;
  /** The hub's reason, for a rejected event. */
  error?: string;
  /** Pushes tried so far. */
  attempts: number;
  /** Epoch ms before which the row is not sent (an undo window is still open). */
  holdUntil?: number;
  /** Epoch ms the hub acknowledged it; acked rows are pruned a day later. */
  ackedAt?: number;
  /** Local only, never sent: the size tile a weed tap came from. */
  size?: string;
}

/** What this tablet knows about a bag beyond the hub's ticket: which tiles it marked done. */
export interface LocalTally {
  weededBySize: Partial<Record<Size | string, number>>;
  weededRosterLineIds: number[];
}

/** A cached ticket, keyed by bag, with the fields the scan looks up by. */
export interface TicketRow {
  bagId: number;
  token: string;
  code: string;
  version: number;
  ticket: StationTicket;
  local: LocalTally;
}

/** A spoil photo kept until the hub has stored it. The blob is never indexed. */
export interface PhotoRow {
  eventId: string;
  state: 'waiting' | 'stored';
  blob: Blob;
  attempts: number;
  error?: string;
}

/** Small named values: lastVersion, lastSyncAt, spoilReasons. */
export interface MetaRow {
  name: 'lastVersion' | 'lastSyncAt' | 'spoilReasons' | 'nextSeq';
  value: number | string | SpoilReason[];
}

/** The station tablet's own database: tickets, the outbox of events, photos waiting, and meta. */
export class StationDb extends Dexie {
  tickets!: EntityTable<TicketRow, 'bagId'>;
  outbox!: EntityTable<OutboxRow, 'id'>;
  photos!: EntityTable<PhotoRow, 'eventId'>;
  meta!: EntityTable<MetaRow, 'name'>;

  constructor(name = 'dwell-station') {
    super(name);
    // Indexes only for what is queried: scan look-ups, pulls by version, the drain order, counts and pruning.
    const stores = {
      tickets: 'bagId, token, code, version',
      outbox: 'id, seq, state, [state+seq], ackedAt',
      photos: 'eventId, state',
      meta: 'name',
    };
    this.version(1).stores(stores);
    // Version 2: a ticket's counts carry spoils per stage. A ticket cached before has only the total, so
    // it goes to the press (a remake the press still owes, as the pack bench read it before) until the
    // next pull, which starts from 0 and replaces every open ticket with the hub's own numbers.
    this.version(2).stores(stores).upgrade(async (tx) => {
      await tx.table<TicketRow, number>('tickets').toCollection().modify((row) => {
        const counts = row.ticket.bag.counts;
        counts.spoiledAt ??= { cut: 0, weed: 0, press: counts.spoiled, pack: 0 };
      });
      await tx.table<MetaRow, string>('meta').delete('lastVersion');
    });
  }
}

/** The one station database of this tablet (specs provide their own). */
export const STATION_DB = new InjectionToken<StationDb>('STATION_DB', {
  providedIn: 'root',
  factory: () => new StationDb(),
});

/** A fresh local tally for a newly cached ticket. */
export function emptyTally(): LocalTally {
  return { weededBySize: {}, weededRosterLineIds: [] };
}
