import { ChangeDetectionStrategy, Component, OnInit, ViewEncapsulation, computed, inject, input, signal } from '@angular/core';
import { DOCUMENT, DatePipe } from '@angular/common';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { SIZES, type BagSummary, type JobDetail, type OrderDetail } from '../../shared/intake-contract';
import { apiErrorSentence } from '../core/api-error';
import { BagQr } from './bag-qr';
import { LabelStock, OrdersApi } from './orders-api';
import { PLACEMENT_LABELS } from './order-display';
import { PRINT_PAGE } from './print-page';

/** One label: a bag with what the floor needs to know at a glance. */
interface Label {
  bag: BagSummary;
  job: JobDetail | undefined;
  url: string;
  sizes: string;
}

const LABELS_PER_SHEET = 4;

/** Bag labels for an order, one per bag, for 4 x 6 in label stock or four to an A4 or Letter sheet. */
@Component({
  selector: 'dw-label-sheet',
  imports: [DatePipe, RouterLink, MatButtonModule, MatButtonToggleModule, MatIconModule, BagQr],
  templateUrl: './label-sheet.html',
  styleUrl: './label-sheet.scss',
  // The print rules must reach the shell around this screen (hide its bar), so they are not scoped.
  encapsulation: ViewEncapsulation.None,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LabelSheet implements OnInit {
  private readonly api = inject(OrdersApi);
  private readonly print = inject(PRINT_PAGE);
  private readonly origin = inject(DOCUMENT).location.origin;

  /** The order's id from the route. */
  readonly id = input.required<string>();

  protected readonly order = signal<OrderDetail | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly stock = signal<LabelStock>('4x6');
  protected readonly stocks: { value: LabelStock; label: string }[] = [
    { value: '4x6', label: '4 × 6 in labels' },
    { value: 'a4', label: 'A4 sheets (4 per sheet)' },
    { value: 'letter', label: 'Letter sheets (4 per sheet)' },
  ];
  protected readonly placements = PLACEMENT_LABELS;

  protected readonly labels = computed<Label[]>(() => {
    const order = this.order();
    if (!order) return [];
    return order.bags.map((bag) => ({
      bag,
      job: order.jobs.find((job) => job.id === bag.jobId),
      url: `${this.origin}/bag/${bag.token}`,
      sizes: SIZES.filter((size) => (bag.sizes[size] ?? 0) > 0)
        .map((size) => `${size} ${bag.sizes[size]}`)
        .join('  '),
    }));
  });
  /** Labels grouped into printed pages: one per page on label stock, four per sheet otherwise. */
  protected readonly pages = computed<Label[][]>(() => {
    const perPage = this.stock() === '4x6' ? 1 : LABELS_PER_SHEET;
    const labels = this.labels();
    const pages: Label[][] = [];
    for (let i = 0; i < labels.length; i += perPage) pages.push(labels.slice(i, i + perPage));
    return pages;
  });

  async ngOnInit(): Promise<void> {
    try {
      this.order.set(await firstValueFrom(this.api.order(Number(this.id()))));
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The order could not be loaded. Try again.'));
    }
  }

  protected pdfUrl(stock: LabelStock): string {
    return this.api.labelsPdfUrl(Number(this.id()), stock);
  }

  protected printLabels(): void {
    this.print();
  }
}
