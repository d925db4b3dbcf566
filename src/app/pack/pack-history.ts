import { Injectable, inject } from '@angular/core';
import { liveQuery } from 'dexie';
import { type Observable, from } from 'rxjs';
import type { StationEvent } from '../../shared/events-contract';
import { type OutboxRow, STATION_DB } from '../sync/station-db';
import type { LocalPackHistory } from './pack-lines';

/** What this tablet packed at the pack bench on a bag, by size, read from its own outbox. */
@Injectable({ providedIn: 'root' })
export class PackHistory {
  private readonly db = inject(STATION_DB);

  /** This tablet's pack history of one bag, as it changes. Rejected events do not count. */
  forBag(bagId: number): Observable<LocalPackHistory> {
    // The outbox keeps acknowledged rows for a day and is small, so a scan of it is cheap.
    return from(liveQuery(async () => historyOf(await this.db.outbox.filter((row) => row.bagId === bagId && row.state !== 'rejected').toArray())));
  }
}

function historyOf(rows: OutboxRow[]): LocalPackHistory {
  const packedBySize: Record<string, number> = {};
  for (const row of rows) {
    if (row.kind !== 'pack_done') continue;
    for (const [size, n] of Object.entries((row as StationEvent<'pack_done'>).payload.sizes ?? {})) packedBySize[size] = (packedBySize[size] ?? 0) + (n ?? 0);
  }
  return { packedBySize };
}
