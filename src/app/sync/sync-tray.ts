import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatBottomSheet, MatBottomSheetModule } from '@angular/material/bottom-sheet';
import { MatIconModule } from '@angular/material/icon';
import { Session } from '../auth/session';
import { SyncPanel, clockTime } from './sync-panel';
import { SyncService } from './sync-service';

/** Sync tray: online or offline, events and photos waiting, last sync; opens the list of waiting and rejected events. */
@Component({
  selector: 'dw-sync-tray',
  imports: [MatBottomSheetModule, MatIconModule],
  templateUrl: './sync-tray.html',
  styleUrl: './sync-tray.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SyncTray {
  private readonly sync = inject(SyncService);
  private readonly sheet = inject(MatBottomSheet);

  // A lead on a station tablet looks at the outbox but does not sync it, so "online" would mislead.
  protected readonly syncing = inject(Session).role() === 'operator';
  protected readonly online = this.sync.online;
  protected readonly stateLabel = computed(() => (!this.syncing ? 'Station outbox' : this.online() ? 'Online' : 'Offline'));
  protected readonly waitingEvents = this.sync.waitingEvents;
  protected readonly waitingPhotos = this.sync.waitingPhotos;
  protected readonly rejectedCount = computed(() => this.sync.rejected().length);
  protected readonly lastSync = computed(() => clockTime(this.sync.lastSyncAt()));

  constructor() {
    // Only an operator's session pushes the station's outbox; a lead on the tablet only looks.
    if (this.syncing) this.sync.start();
  }

  protected openPanel(): void {
    this.sheet.open(SyncPanel, { ariaLabel: 'Sync tray' });
  }
}
