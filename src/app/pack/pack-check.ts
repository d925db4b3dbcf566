import { ChangeDetectionStrategy, Component, computed, inject, input, linkedSignal, signal } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { Router, RouterLink } from '@angular/router';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { of, switchMap } from 'rxjs';
import type { StationTicket } from '../../shared/events-contract';
import { BagScan } from '../scan/bag-scan';
import { StationEvents } from '../sync/station-events';
import { TicketCache } from '../sync/ticket-cache';
import { PackHistory } from './pack-history';
import { NO_PACK_HISTORY, type PackLine, packLines, packProgress, sizesOf } from './pack-lines';

/** Pack check: scan a bag, tick off its sizes (or roster lines) as garments go in, then mark it packed; works offline. */
@Component({
  selector: 'dw-pack-check',
  imports: [BagScan, RouterLink, MatButtonModule, MatIconModule],
  templateUrl: './pack-check.html',
  styleUrl: './pack-check.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PackCheck {
  private readonly cache = inject(TicketCache);
  private readonly events = inject(StationEvents);
  private readonly history = inject(PackHistory);
  private readonly router = inject(Router);

  /** The bag from the address (`/pack?bag=12`), e.g. when opened from a QR code. */
  readonly bag = input<string>();

  protected readonly bagId = linkedSignal<number | null>(() => {
    const id = Number(this.bag());
    return Number.isInteger(id) && id > 0 ? id : null;
  });
  protected readonly row = toSignal(toObservable(this.bagId).pipe(switchMap((id) => (id ? this.cache.row(id) : of(undefined)))));
  private readonly packHistory = toSignal(
    toObservable(this.bagId).pipe(switchMap((id) => (id ? this.history.forBag(id) : of(NO_PACK_HISTORY)))),
    { initialValue: NO_PACK_HISTORY },
  );
  protected readonly ticket = computed(() => this.row()?.ticket ?? null);
  protected readonly lines = computed(() => {
    const row = this.row();
    return row ? packLines(row, this.packHistory()) : [];
  });
  protected readonly progress = computed(() => {
    const ticket = this.ticket();
    return ticket ? packProgress(ticket.bag) : null;
  });

  /** Garments counted into the bag now, by line key; starts empty for each bag. */
  protected readonly counted = linkedSignal<number | null, Record<string, number>>({ source: this.bagId, computation: () => ({}) });
  protected readonly countedTotal = computed(() => Object.values(this.counted()).reduce((a, b) => a + b, 0));
  protected readonly leftToCount = computed(() => this.lines().reduce((sum, line) => sum + this.remaining(line) - this.countOf(line), 0));
  protected readonly confirming = signal(false);
  protected readonly saving = signal(false);
  protected readonly result = signal<string | null>(null);
  protected readonly problem = signal<string | null>(null);

  /** Why packing the count now is not the plain case; the operator confirms these first. */
  protected readonly cautions = computed(() => {
    const progress = this.progress();
    const count = this.countedTotal();
    if (!progress || count === 0) return [];
    const out: string[] = [];
    if (progress.remakesOwed > 0) {
      out.push(`${plural(progress.remakesOwed, 'remake')} ${progress.remakesOwed === 1 ? 'is' : 'are'} still owed, so the bag cannot be complete yet.`);
    }
    if (count < progress.toPack) out.push(`This packs ${count} of the ${progress.toPack} pieces still to pack. The bag stays open for the rest.`);
    if (count > progress.readyToPack) {
      out.push(`Only ${plural(progress.readyToPack, 'piece')} ${progress.readyToPack === 1 ? 'is' : 'are'} recorded as pressed and not yet packed. Packing ${count} flags the bag for the lead to check.`);
    }
    return out;
  });

  protected bagScanned(result: StationTicket | string): void {
    if (typeof result === 'string') return;
    this.problem.set(null);
    this.result.set(null);
    this.confirming.set(false);
    this.bagId.set(result.bag.id);
    // The bag goes in the address, so a reload (or the way back from the Spoil report) opens the same bag.
    void this.router.navigate([], { queryParams: { bag: result.bag.id }, replaceUrl: true });
    void this.events.record('scan', result.bag.id, 0, {}).catch((error: unknown) => this.fail(error));
  }

  protected remaining(line: PackLine): number {
    return Math.max(0, line.ordered - line.packed);
  }

  protected countOf(line: PackLine): number {
    return this.counted()[line.key] ?? 0;
  }

  protected ticked(line: PackLine): boolean {
    return line.packed + this.countOf(line) >= line.ordered;
  }

  /** The big tick: every garment still owed on this line is in the bag; a second tap clears the line's count. */
  protected lineTapped(line: PackLine): void {
    const remaining = this.remaining(line);
    if (remaining === 0) return;
    this.setCount(line, this.countOf(line) >= remaining ? 0 : remaining);
  }

  /** One garment more or fewer on a size line. */
  protected step(line: PackLine, by: 1 | -1): void {
    this.setCount(line, Math.min(this.remaining(line), Math.max(0, this.countOf(line) + by)));
  }

  /** Ticks every line: all garments still owed are in the bag. */
  protected tickAll(): void {
    this.counted.set(Object.fromEntries(this.lines().map((line) => [line.key, this.remaining(line)]).filter(([, n]) => (n as number) > 0)));
    this.afterChange();
  }

  /** "Mark packed": records at once when the count is the whole bag; otherwise asks first. */
  protected async markPacked(): Promise<void> {
    if (this.countedTotal() === 0) return;
    if (this.cautions().length && !this.confirming()) {
      this.confirming.set(true);
      return;
    }
    await this.pack();
  }

  protected keepCounting(): void {
    this.confirming.set(false);
  }

  /** Records one pack_done for the garments counted now (outbox first, so it holds with no network). */
  protected async pack(): Promise<void> {
    const ticket = this.ticket();
    const progress = this.progress();
    const quantity = this.countedTotal();
    if (!ticket || !progress || quantity === 0 || this.saving()) return;
    this.saving.set(true);
    this.problem.set(null);
    try {
      await this.events.record('pack_done', ticket.bag.id, quantity, { sizes: sizesOf(this.lines(), this.counted()) });
      const left = progress.toPack - quantity;
      this.result.set(left <= 0
        ? `Bag ${ticket.bag.code} packed: all ${plural(progress.pieces, 'piece')} are in. Order ${ticket.order.code} is ready once its last bag is packed.`
        : `Bag ${ticket.bag.code}: ${quantity} packed now, ${left} still to pack. The bag stays open.`);
      this.counted.set({});
      this.confirming.set(false);
    } catch (error) {
      this.fail(error);
    } finally {
      this.saving.set(false);
    }
  }

  private setCount(line: PackLine, n: number): void {
    this.counted.update((counted) => {
      const { [line.key]: _old, ...rest } = counted;
      return n > 0 ? { ...rest, [line.key]: n } : rest;
    });
    this.afterChange();
  }

  private afterChange(): void {
    this.confirming.set(false);
    this.result.set(null);
  }

  private fail(error: unknown): void {
    this.problem.set(error instanceof Error ? error.message : 'That was not saved. Try again.');
  }
}

function plural(n: number, word: string): string {
  return `${n} ${n === 1 ? word : `${word}s`}`;
}
