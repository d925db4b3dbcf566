import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { Router, RouterLink } from '@angular/router';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { catchError, debounceTime, distinctUntilChanged, map, of, startWith, switchMap } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, PageEvent } from '@angular/material/paginator';
import { MatSelectModule } from '@angular/material/select';
import { MatSortModule, Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { BAG_STAGES } from '../../shared/names';
import type { OrderListItem, OrderPage, OrderStatus } from '../../shared/intake-contract';
import { apiErrorSentence } from '../core/api-error';
import { OrderQuery, OrdersApi } from './orders-api';
import { STAGE_LABELS, STATUS_LABELS, dueFlag } from './order-display';

type PageState =
  | { status: 'loading' }
  | { status: 'loaded'; page: OrderPage }
  | { status: 'failed'; sentence: string };

const SORTABLE = ['dueAt', 'code', 'customer', 'pieces'] as const;

/** The Orders screen: every order with its due time and progress, searched, filtered and sorted on the hub. */
@Component({
  selector: 'dw-orders-page',
  imports: [
    DatePipe,
    RouterLink,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatPaginatorModule,
    MatSelectModule,
    MatSortModule,
    MatTableModule,
  ],
  templateUrl: './orders-page.html',
  styleUrl: './orders-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OrdersPage {
  private readonly api = inject(OrdersApi);
  private readonly router = inject(Router);

  protected readonly columns = ['code', 'customer', 'dueAt', 'pieces', 'progress', 'status'];
  protected readonly stages = BAG_STAGES;
  protected readonly stageLabels = STAGE_LABELS;
  protected readonly statusLabels = STATUS_LABELS;
  protected readonly statuses = Object.keys(STATUS_LABELS) as OrderStatus[];
  protected readonly now = new Date();

  protected readonly searchText = signal('');
  protected readonly query = signal<OrderQuery>({ q: '', status: 'open', sort: 'dueAt', dir: 'asc', page: 1, pageSize: 20 });

  private readonly debouncedSearch = toObservable(this.searchText)
    .pipe(debounceTime(300), distinctUntilChanged())
    .subscribe((q) => this.query.update((query) => (query.q === q ? query : { ...query, q, page: 1 })));

  protected readonly state = toSignal(
    toObservable(this.query).pipe(
      switchMap((query) =>
        this.api.orders(query).pipe(
          map((page): PageState => ({ status: 'loaded', page })),
          catchError((error: unknown) => of<PageState>({ status: 'failed', sentence: apiErrorSentence(error) })),
          startWith<PageState>({ status: 'loading' }),
        ),
      ),
    ),
    { initialValue: { status: 'loading' } as PageState },
  );
  protected readonly page = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.page : null;
  });
  protected readonly rows = computed(() => this.page()?.items ?? []);
  protected readonly total = computed(() => this.page()?.total ?? 0);
  protected readonly failure = computed(() => {
    const state = this.state();
    return state.status === 'failed' ? state.sentence : null;
  });

  protected searchTyped(text: string): void {
    this.searchText.set(text);
  }

  protected statusChosen(status: OrderStatus | ''): void {
    this.query.update((query) => ({ ...query, status, page: 1 }));
  }

  protected sortChanged(sort: Sort): void {
    const column = SORTABLE.find((name) => name === sort.active) ?? 'dueAt';
    this.query.update((query) => ({ ...query, sort: column, dir: sort.direction || 'asc', page: 1 }));
  }

  protected pageChanged(event: PageEvent): void {
    this.query.update((query) => ({ ...query, page: event.pageIndex + 1, pageSize: event.pageSize }));
  }

  protected openOrder(order: OrderListItem): void {
    void this.router.navigate(['/orders', order.id]);
  }

  protected statusLabel(order: OrderListItem): string {
    return STATUS_LABELS[order.status];
  }

  protected due(order: OrderListItem): 'overdue' | 'today' | null {
    return order.status === 'open' ? dueFlag(order.dueAt, this.now) : null;
  }

  /** Share of the order's pieces in a stage, as a CSS width. */
  protected stageShare(order: OrderListItem, stage: (typeof BAG_STAGES)[number]): string {
    return order.pieces ? `${(100 * order.piecesByStage[stage]) / order.pieces}%` : '0%';
  }
}
