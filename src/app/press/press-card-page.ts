import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { Router } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { of, switchMap } from 'rxjs';
import type { StationTicket } from '../../shared/events-contract';
import { PLACEMENT_LABELS } from '../orders/order-display';
import { BagScan } from '../scan/bag-scan';
import { StationEvents } from '../sync/station-events';
import { TicketCache } from '../sync/ticket-cache';
import { PressCardView } from './press-card-view';
import { PressCautions } from './press-cautions';
import { PressCountdown } from './press-countdown';

/** The Press station: scan a bag, read its Press card, run the countdown, count pressed pieces. */
@Component({
  selector: 'dw-press-card-page',
  imports: [MatButtonModule, MatIconModule, BagScan, PressCardView, PressCautions, PressCountdown],
  templateUrl: './press-card-page.html',
  styleUrl: './press-card-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PressCardPage {
  private readonly cache = inject(TicketCache);
  private readonly events = inject(StationEvents);
  private readonly router = inject(Router);

  private readonly scannedTicket = signal<StationTicket | null>(null);
  private readonly bagId = computed(() => this.scannedTicket()?.bag.id ?? null);
  // The cached ticket as it changes: a counted piece shows at once, before the hub has it.
  private readonly liveTicket = toSignal(
    toObservable(this.bagId).pipe(switchMap((id) => (id === null ? of(undefined) : this.cache.ticket(id)))),
  );

  protected readonly ticket = computed(() => this.liveTicket() ?? this.scannedTicket());
  protected readonly card = computed(() => this.ticket()?.pressCard ?? null);
  protected readonly placement = computed(() => {
    const job = this.ticket()?.job;
    return job ? PLACEMENT_LABELS[job.placement] : '';
  });
  protected readonly countProblem = signal<string | null>(null);
  // A scanned bag the station does not keep (not cut yet, say) can leave the cache at the next pull,
  // so its local count is lost there: then the pieces recorded here are added to the scanned count.
  private readonly uncachedPresses = signal(0);
  protected readonly pressed = computed(() => {
    const live = this.liveTicket();
    return live ? live.bag.counts.pressed : (this.scannedTicket()?.bag.counts.pressed ?? 0) + this.uncachedPresses();
  });

  /** A bag was found: show its card. A sentence (no bag) is shown by the scanner itself. */
  protected showBag(result: StationTicket | string): void {
    if (typeof result === 'string') return;
    this.countProblem.set(null);
    this.uncachedPresses.set(0);
    this.scannedTicket.set(result);
  }

  /** The countdown's last step ended: one pressed piece, written to this tablet first. */
  protected async countPressedPiece(): Promise<void> {
    const ticket = this.ticket();
    const card = this.card();
    if (!ticket || !card) return;
    try {
      await this.events.record('press_done', ticket.bag.id, 1, { pressId: card.press.id, temperatureC: card.temperatureC, dwellS: card.dwellS });
      this.uncachedPresses.update((n) => n + 1);
      this.countProblem.set(null);
    } catch {
      this.countProblem.set('That piece could not be saved on this tablet. Mark it on the paper ticket and tell your lead.');
    }
  }

  /** Opens the Spoil report for this bag. */
  protected async logSpoil(): Promise<void> {
    const ticket = this.ticket();
    if (ticket) await this.router.navigate(['/spoil'], { queryParams: { bag: ticket.bag.id } });
  }
}
