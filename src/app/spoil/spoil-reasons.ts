import { Injectable, inject, signal } from '@angular/core';
import { HttpClient } from '@angular/common/http';
import { firstValueFrom } from 'rxjs';
import type { SpoilReason } from '../../shared/events-contract';
import { STATION_DB } from '../sync/station-db';

/** The shop's spoil reasons: from the hub when it answers, else the copy kept in Dexie. */
@Injectable({ providedIn: 'root' })
export class SpoilReasons {
  private readonly http = inject(HttpClient);
  private readonly db = inject(STATION_DB);
  private readonly list = signal<SpoilReason[]>([]);
  private readonly loadedFromHub = signal(false);

  /** Active reasons in the shop's order. */
  readonly reasons = this.list.asReadonly();
  /** False while the list shown is the tablet's copy. */
  readonly fresh = this.loadedFromHub.asReadonly();

  /** Loads the list: the kept copy at once, then the hub's list if it answers. */
  async load(): Promise<void> {
    const kept = (await this.db.meta.get('spoilReasons'))?.value as SpoilReason[] | undefined;
    if (kept) this.list.set(ordered(kept));
    try {
      const reasons = await firstValueFrom(this.http.get<SpoilReason[]>('/api/spoil-reasons'));
      await this.db.meta.put({ name: 'spoilReasons', value: reasons });
      this.list.set(ordered(reasons));
      this.loadedFromHub.set(true);
    } catch {
      // Offline: the kept copy stands.
    }
  }
}

function ordered(reasons: SpoilReason[]): SpoilReason[] {
  return reasons.filter((reason) => reason.active).sort((a, b) => a.position - b.position);
}
