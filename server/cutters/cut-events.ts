import { v4 as uuidv4 } from 'uuid';
import type { StationSummary } from '../../src/shared/auth-contract';
import type { EventPayloads, StationEvent } from '../../src/shared/events-contract';
import type { EventKind } from '../../src/shared/names';
import type { Principal } from '../auth/principal';
import type { Db } from '../db/tables';
import { EventsService } from '../events/events-service';
import type { FloorBroadcast } from '../events/floor-broadcast';
import { conflict } from '../http/http-error';

/** One event made on the hub for a cut, with a fresh UUID v4 as its key. */
export function hubEvent<K extends EventKind>(kind: K, bagId: number, stationId: number, userId: number, quantity: number, payload: EventPayloads[K]): StationEvent<K> {
  return { id: uuidv4(), bagId, stationId, userId, kind, quantity, clientAt: new Date().toISOString(), payload };
}

/**
 * Cut events go through the events service, which accepts station events only from an operator
 * signed in at that station. An operator at the cut station reports as themselves; an owner or lead
 * confirming from the office reports at the cutter's cut station under their own user id, so the
 * event still says who did it and where the work happened.
 */
export function reporterAt(principal: Principal, cutStation: StationSummary): Principal {
  if (principal.role === 'operator' && principal.station?.kind === 'cut') return principal;
  return { ...principal, role: 'operator', station: cutStation };
}

/** Records hub-made cut events through the events service and tells the floor afterwards. */
export class CutFloorEvents {
  constructor(private readonly floor: FloorBroadcast | undefined) {}

  /** Stores events on `db` (a transaction, so they commit or roll back with the cut); a refused event becomes a 409. */
  async record(db: Db, reporter: Principal, events: StationEvent[]): Promise<void> {
    if (events.length === 0) return;
    const reply = await new EventsService(db).ingest(reporter, events);
    const [first] = reply.rejected;
    if (first) throw conflict(`The floor record refused the cut: ${first.error}`);
  }

  /** After the commit: the board and the stations hear that these bags changed. */
  announce(bagIds: number[], version: number): void {
    this.floor?.bagsChanged(bagIds, version);
  }
}
