import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatBottomSheetRef } from '@angular/material/bottom-sheet';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { liveQuery } from 'dexie';
import { from } from 'rxjs';
import { Session } from '../auth/session';
import { STATION_DB, type OutboxRow } from './station-db';
import { SyncService } from './sync-service';

const KIND_WORDS: Record<string, string> = {
  scan: 'Scanned', test_cut: 'Test cut', cut_done: 'Cut', weed_done: 'Weeded', press_done: 'Pressed', spoil: 'Spoil', pack_done: 'Packed',
};

/** The sync tray's panel: events waiting in order, and events the hub refused with its reasons. */
@Component({
  selector: 'dw-sync-panel',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './sync-panel.html',
  styleUrl: './sync-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SyncPanel {
  private readonly sync = inject(SyncService);
  private readonly db = inject(STATION_DB);
  private readonly ref = inject(MatBottomSheetRef<SyncPanel>);
  private readonly codes = toSignal(from(liveQuery(async () => new Map((await this.db.tickets.toArray()).map((t) => [t.bagId, t.code])))), {
    initialValue: new Map<number, string>(),
  });

  protected readonly online = this.sync.online;
  // Read only while the panel is open, so a long drain does not re-read the list after every batch.
  protected readonly waiting = toSignal(from(liveQuery(() => this.sync.waitingList())), { initialValue: [] as OutboxRow[] });
  protected readonly waitingCount = this.sync.waitingEvents;
  protected readonly waitingPhotos = this.sync.waitingPhotos;
  protected readonly rejected = this.sync.rejected;
  protected readonly lastSync = computed(() => clockTime(this.sync.lastSyncAt()));
  private readonly session = inject(Session);
  protected readonly canDiscard = computed(() => {
    const role = this.session.role();
    return role === 'lead' || role === 'owner';
  });
  protected readonly problem = signal<string | null>(null);

  protected describe(row: OutboxRow): string {
    const bag = this.codes().get(row.bagId) ?? `#${row.bagId}`;
    const pieces = row.kind === 'scan' ? '' : `, ${row.quantity} ${row.quantity === 1 ? 'piece' : 'pieces'}`;
    return `${KIND_WORDS[row.kind] ?? row.kind} · bag ${bag}${pieces} · ${clockTime(row.clientAt)}`;
  }

  protected async discard(row: OutboxRow): Promise<void> {
    try {
      await this.sync.discard(row.id);
    } catch {
      this.problem.set('The event could not be discarded. Try again.');
    }
  }

  protected close(): void {
    this.ref.dismiss();
  }
}

/** "14:05" for today, or the date and time for older moments; "never" when there was none. */
export function clockTime(iso: string | null): string {
  if (!iso) return 'never';
  const at = new Date(iso);
  const sameDay = at.toDateString() === new Date().toDateString();
  const time = at.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
  return sameDay ? time : `${at.toLocaleDateString([], { day: 'numeric', month: 'short' })} ${time}`;
}
