import { Injectable, inject } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { liveQuery } from 'dexie';
import { type Observable, firstValueFrom, from, map } from 'rxjs';
import { hasStatus } from '../core/api-error';
import type { StationTicket, TicketsReply } from '../../shared/events-contract';
import { STATION_DB, type StationDb, type TicketRow, emptyTally } from './station-db';
import { withEvent } from './ticket-counts';

/** The station's open bags, kept in Dexie so scans and screens work with no network. */
@Injectable({ providedIn: 'root' })
export class TicketCache {
  private readonly db = inject(STATION_DB);
  private readonly http = inject(HttpClient);

  /** The cached bag with this human code (e.g. "1043-B"); pulls once from the hub when it is not here yet. */
  async findByCode(code: string): Promise<StationTicket | null> {
    const wanted = code.trim().toUpperCase();
    const cached = await this.db.tickets.where('code').equals(wanted).first();
    if (cached) return cached.ticket;
    try {
      await this.refresh();
    } catch (error) {
      // 0: no network; 504: the service worker answering for a hub it cannot reach.
      if (!hasStatus(error, 0, 504)) throw error;
      return null;
    }
    return (await this.db.tickets.where('code').equals(wanted).first())?.ticket ?? null;
  }

  /** The bag behind a QR token: from the cache, else from the hub (then cached). Null when the hub does not know it. */
  async findByToken(token: string): Promise<StationTicket | null> {
    const cached = await this.db.tickets.where('token').equals(token).first();
    if (cached) return cached.ticket;
    try {
      const ticket = await firstValueFrom(this.http.get<StationTicket>(`/api/tickets/by-token/${encodeURIComponent(token)}`));
      await this.store([ticket]);
      return ticket;
    } catch (error) {
      if (hasStatus(error, 404, 403)) return null;
      throw error;
    }
  }

  /** One bag's ticket as it changes in Dexie (undefined until cached). */
  ticket(bagId: number): Observable<StationTicket | undefined> {
    return this.row(bagId).pipe(map((row) => row?.ticket));
  }

  /** One bag's cached row, with this tablet's tally, as it changes. */
  row(bagId: number): Observable<TicketRow | undefined> {
    return from(liveQuery(() => this.db.tickets.get(bagId)));
  }

  /** Pulls the bags changed since the last pull and stores them; forgets bags that left the station. */
  async refresh(): Promise<void> {
    const since = ((await this.db.meta.get('lastVersion'))?.value as number | undefined) ?? 0;
    const reply = await firstValueFrom(this.http.get<TicketsReply>('/api/tickets', { params: { since } }));
    await this.store(reply.tickets);
    await this.db.transaction('rw', this.db.tickets, this.db.meta, async () => {
      if (reply.closedBagIds.length) await this.db.tickets.bulkDelete(reply.closedBagIds);
      const current = ((await this.db.meta.get('lastVersion'))?.value as number | undefined) ?? 0;
      await this.db.meta.put({ name: 'lastVersion', value: Math.max(current, reply.version) });
      await this.db.meta.put({ name: 'lastSyncAt', value: new Date().toISOString() });
    });
  }

  /** Stores tickets from the hub, keeping this tablet's tally and the effect of events not yet acknowledged. */
  async store(tickets: StationTicket[]): Promise<void> {
    if (!tickets.length) return;
    await this.db.transaction('rw', this.db.tickets, this.db.outbox, async () => {
      // Read the unacknowledged events once (key-range reads), not once per ticket.
      const unacked = [
        ...(await this.db.outbox.where('state').equals('pending').toArray()),
        ...(await this.db.outbox.where('state').equals('sent').toArray()),
      ].sort((a, b) => a.seq - b.seq);
      for (const ticket of tickets) {
        const existing = await this.db.tickets.get(ticket.bag.id);
        if (existing && existing.version > ticket.version) continue;
        let row: TicketRow = {
          bagId: ticket.bag.id,
          token: ticket.bag.token,
          code: ticket.bag.code.toUpperCase(),
          version: ticket.version,
          ticket,
          local: existing?.local ?? emptyTally(),
        };
        // The hub's counts do not hold events still in the outbox: count them again so the screen does not jump back.
        const waiting = unacked.filter((event) => event.bagId === ticket.bag.id);
        const local = row.local;
        for (const event of waiting) row = withEvent({ ...row, local: { weededBySize: {}, weededRosterLineIds: [] } }, event, 1);
        row.local = local;
        await this.db.tickets.put(row);
      }
    });
  }
}
