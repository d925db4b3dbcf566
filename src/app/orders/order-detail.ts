import { ChangeDetectionStrategy, Component, OnInit, computed, inject, input, signal } from '@angular/core';
import { DatePipe, DecimalPipe } from '@angular/common';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { SIZES, type BagSummary, type JobDetail, type OrderDetail, type SizeQuantities } from '../../shared/intake-contract';
import { apiErrorSentence } from '../core/api-error';
import { CancelOrderDialog } from './cancel-order-dialog';
import { OrdersApi } from './orders-api';
import { PLACEMENT_LABELS, STAGE_LABELS, STATUS_LABELS, inchesFromMm } from './order-display';

/** Bags hold at most this many pieces unless the lead says otherwise (common practice, no published source). */
const DEFAULT_BAG_PIECES = 24;

/** One order: customer, due time, its jobs with their designs, and the bags they were split into. */
@Component({
  selector: 'dw-order-detail',
  imports: [DatePipe, DecimalPipe, RouterLink, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './order-detail.html',
  styleUrl: './order-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OrderDetailPage implements OnInit {
  private readonly api = inject(OrdersApi);
  private readonly dialog = inject(MatDialog);

  /** The order's id from the route. */
  readonly id = input.required<string>();

  protected readonly order = signal<OrderDetail | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly confirmation = signal<string | null>(null);
  protected readonly busyJob = signal<number | null>(null);
  protected readonly maxPieces = signal<Record<number, number>>({});
  protected readonly placements = PLACEMENT_LABELS;
  protected readonly stages = STAGE_LABELS;
  protected readonly statuses = STATUS_LABELS;
  protected readonly defaultBagPieces = DEFAULT_BAG_PIECES;
  protected readonly open = computed(() => this.order()?.status === 'open');

  async ngOnInit(): Promise<void> {
    await this.load();
  }

  protected bagsOf(job: JobDetail): BagSummary[] {
    return this.order()?.bags.filter((bag) => bag.jobId === job.id) ?? [];
  }

  protected inches(mm: number): string {
    return inchesFromMm(mm).toFixed(2);
  }

  protected sizeList(quantities: SizeQuantities): string {
    return SIZES.filter((size) => (quantities[size] ?? 0) > 0)
      .map((size) => `${size} ${quantities[size]}`)
      .join(' · ');
  }

  protected maxPiecesFor(job: JobDetail): number {
    return this.maxPieces()[job.id] ?? DEFAULT_BAG_PIECES;
  }

  protected maxPiecesTyped(job: JobDetail, text: string): void {
    this.maxPieces.update((all) => ({ ...all, [job.id]: Number(text) }));
  }

  protected async splitIntoBags(job: JobDetail): Promise<void> {
    const maxPieces = this.maxPiecesFor(job);
    this.problem.set(null);
    this.confirmation.set(null);
    if (!Number.isInteger(maxPieces) || maxPieces < 1) {
      this.problem.set(`Enter how many pieces go in one bag for ${job.name}: a whole number of 1 or more.`);
      return;
    }
    this.busyJob.set(job.id);
    try {
      const bags = await firstValueFrom(this.api.splitIntoBags(job.id, maxPieces));
      this.confirmation.set(`${job.name} is in ${bags.length} ${bags.length === 1 ? 'bag' : 'bags'}.`);
      await this.load();
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The job could not be split into bags. Try again.'));
    } finally {
      this.busyJob.set(null);
    }
  }

  protected async cancelOrder(): Promise<void> {
    const order = this.order();
    if (!order) return;
    const confirmed = await firstValueFrom(
      this.dialog.open<CancelOrderDialog, { code: string }, boolean>(CancelOrderDialog, { data: { code: order.code } }).afterClosed(),
    );
    if (!confirmed) return;
    this.problem.set(null);
    try {
      this.order.set(await firstValueFrom(this.api.cancelOrder(order.id)));
      this.confirmation.set(`Order ${order.code} is cancelled.`);
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The order could not be cancelled. Try again.'));
    }
  }

  private async load(): Promise<void> {
    try {
      this.order.set(await firstValueFrom(this.api.order(Number(this.id()))));
    } catch (error) {
      this.problem.set(apiErrorSentence(error, 'The order could not be loaded. Try again.'));
    }
  }
}
