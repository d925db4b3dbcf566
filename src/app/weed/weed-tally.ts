import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { Router, RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { of, switchMap } from 'rxjs';
import type { StationTicket } from '../../shared/events-contract';
import { BagScan } from '../scan/bag-scan';
import { StationEvents, UNDO_WINDOW_MS } from '../sync/station-events';
import { TicketCache } from '../sync/ticket-cache';
import { type WeedTile, weedTiles } from './weed-tiles';

/** A tap that can still be taken back. */
interface RecentTap {
  eventId: string;
  tileKey: string;
}

/** Weed tally: scan a bag, tap each piece (or roster line) as it is weeded; taps go out after a 5 s undo window. */
@Component({
  selector: 'dw-weed-tally',
  imports: [BagScan, RouterLink, MatButtonModule, MatIconModule, MatProgressBarModule],
  templateUrl: './weed-tally.html',
  styleUrl: './weed-tally.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WeedTally {
  private readonly cache = inject(TicketCache);
  private readonly events = inject(StationEvents);
  private readonly router = inject(Router);
  private readonly timers = new Set<ReturnType<typeof setTimeout>>();

  /** The bag from the address (`/weed?bag=12`), e.g. when opened from a QR code. */
  readonly bag = input<string>();

  protected readonly bagId = linkedSignal<number | null>(() => {
    const id = Number(this.bag());
    return Number.isInteger(id) && id > 0 ? id : null;
  });
  protected readonly row = toSignal(toObservable(this.bagId).pipe(switchMap((id) => (id ? this.cache.row(id) : of(undefined)))));
  protected readonly ticket = computed(() => this.row()?.ticket ?? null);
  protected readonly tiles = computed(() => {
    const row = this.row();
    return row ? weedTiles(row) : [];
  });
  protected readonly pieces = computed(() => this.ticket()?.bag.pieces ?? 0);
  protected readonly weeded = computed(() => Math.min(this.ticket()?.bag.counts.weeded ?? 0, this.pieces()));
  protected readonly remaining = computed(() => Math.max(0, this.pieces() - (this.ticket()?.bag.counts.weeded ?? 0)));
  protected readonly percent = computed(() => (this.pieces() ? (100 * this.weeded()) / this.pieces() : 0));
  protected readonly recent = signal<RecentTap[]>([]);
  protected readonly problem = signal<string | null>(null);

  constructor() {
    inject(DestroyRef).onDestroy(() => {
      for (const timer of this.timers) clearTimeout(timer);
    });
  }

  protected bagScanned(result: StationTicket | string): void {
    if (typeof result === 'string') return;
    this.problem.set(null);
    this.recent.set([]);
    this.bagId.set(result.bag.id);
    // The bag goes in the address, so a reload (or the way back from the Spoil report) opens the same bag.
    void this.router.navigate([], { queryParams: { bag: result.bag.id }, replaceUrl: true });
    void this.events.record('scan', result.bag.id, 0, {}).catch((error: unknown) => this.fail(error));
  }

  protected undoable(tile: WeedTile): boolean {
    return this.recent().some((tap) => tap.tileKey === tile.key);
  }

  /** Tap on a tile: one more piece done; on a roster line just marked, the tap takes it back. */
  protected async tileTapped(tile: WeedTile): Promise<void> {
    const bagId = this.bagId();
    if (!bagId) return;
    if (tile.rosterLineId !== undefined && tile.done && this.undoable(tile)) return this.undoTile(tile);
    if (tile.done >= tile.total) return;
    try {
      const event = tile.rosterLineId !== undefined
        ? await this.events.recordWithUndo('weed_done', bagId, 1, { rosterLineIds: [tile.rosterLineId] })
        : await this.events.recordWithUndo('weed_done', bagId, 1, {}, { size: tile.size });
      this.remember({ eventId: event.id, tileKey: tile.key });
    } catch (error) {
      this.fail(error);
    }
  }

  /** Takes back the latest tap on a tile while its undo window is open. */
  protected async undoTile(tile: WeedTile): Promise<void> {
    const tap = [...this.recent()].reverse().find((t) => t.tileKey === tile.key);
    if (!tap) return;
    this.recent.update((taps) => taps.filter((t) => t !== tap));
    const undone = await this.events.undo(tap.eventId);
    if (!undone) this.problem.set('That piece was already sent to the hub. Log a spoil if it was not really done.');
  }

  /** "All N remaining done": one event for every piece not yet weeded. */
  protected async allRemainingDone(): Promise<void> {
    const bagId = this.bagId();
    const remaining = this.remaining();
    if (!bagId || remaining <= 0) return;
    const lines = this.tiles().filter((tile) => tile.rosterLineId !== undefined && !tile.done).map((tile) => tile.rosterLineId!);
    try {
      const event = await this.events.recordWithUndo('weed_done', bagId, remaining, lines.length ? { rosterLineIds: lines } : {});
      this.remember({ eventId: event.id, tileKey: 'all' });
    } catch (error) {
      this.fail(error);
    }
  }

  protected async undoAll(): Promise<void> {
    await this.undoTile({ key: 'all', title: '', detail: '', done: 0, total: 0 });
  }

  protected allUndoable(): boolean {
    return this.recent().some((tap) => tap.tileKey === 'all');
  }

  private remember(tap: RecentTap): void {
    this.recent.update((taps) => [...taps, tap]);
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      this.recent.update((taps) => taps.filter((t) => t !== tap));
    }, UNDO_WINDOW_MS);
    this.timers.add(timer);
  }

  private fail(error: unknown): void {
    this.problem.set(error instanceof Error ? error.message : 'That tap was not saved. Try again.');
  }
}
