import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import { MatIconModule } from '@angular/material/icon';
import type { BoardOrder } from '../../shared/board-contract';
import type { BoardMode } from './board-charts';
import { dayAndTime, KIND_LABELS } from './board-format';

/** Open orders, soonest due first, with their ETA; an order at risk says so in words and with an icon. */
@Component({
  selector: 'dw-orders-at-risk',
  imports: [RouterLink, MatIconModule],
  templateUrl: './orders-at-risk.html',
  styleUrl: './orders-at-risk.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[class.wall]': 'mode() === "wall"' },
})
export class OrdersAtRisk {
  readonly orders = input.required<readonly BoardOrder[]>();
  /** When the board was made: "Today" and "Tomorrow" are counted from it. */
  readonly now = input.required<Date>();
  /** Whether each order links to its page (the lead's screen; a wall display has nothing to tap). */
  readonly links = input(false);
  /** Rows to show at most; the rest are counted below the table. */
  readonly maxRows = input<number | null>(null);
  readonly mode = input<BoardMode>('lead');

  protected readonly kindLabels = KIND_LABELS;
  protected readonly atRiskCount = computed(() => this.orders().filter((order) => order.atRisk).length);
  protected readonly shown = computed(() => {
    const max = this.maxRows();
    return max === null ? this.orders() : this.orders().slice(0, max);
  });
  protected readonly hidden = computed(() => this.orders().length - this.shown().length);

  /** Day and time apart, so a narrow column breaks between them and never inside a date. */
  protected whenParts(iso: string | null): { day: string; time: string } {
    return dayAndTime(iso, this.now());
  }
}
