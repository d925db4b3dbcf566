import { Injectable, inject } from '@angular/core';
import { HttpClient, HttpParams } from '@angular/common/http';
import { Observable } from 'rxjs';
import type {
  BagSummary,
  Customer,
  DesignUpload,
  FabricOption,
  FilmOption,
  JobCreate,
  JobDetail,
  OrderCreate,
  OrderDetail,
  OrderPage,
  OrderStatus,
  OrderUpdate,
} from '../../shared/intake-contract';

/** The Orders table's query: what the lead searched, filtered and sorted by. */
export interface OrderQuery {
  q: string;
  status: OrderStatus | '';
  sort: 'dueAt' | 'code' | 'customer' | 'pieces';
  dir: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

/** The label stocks the hub can lay labels out on. */
export type LabelStock = '4x6' | 'a4' | 'letter';

/** Hub calls for intake: customers, orders, jobs, designs, bags. */
@Injectable({ providedIn: 'root' })
export class OrdersApi {
  private readonly http = inject(HttpClient);

  /** Customers whose name matches `q`. */
  customers(q: string): Observable<Customer[]> {
    return this.http.get<Customer[]>('/api/customers', { params: { q } });
  }

  /** One page of orders; empty search and filter are left out of the query. */
  orders(query: OrderQuery): Observable<OrderPage> {
    let params = new HttpParams()
      .set('sort', query.sort)
      .set('dir', query.dir)
      .set('page', query.page)
      .set('pageSize', query.pageSize);
    if (query.q.trim()) params = params.set('q', query.q.trim());
    if (query.status) params = params.set('status', query.status);
    return this.http.get<OrderPage>('/api/orders', { params });
  }

  /** Creates an order. */
  createOrder(order: OrderCreate): Observable<OrderDetail> {
    return this.http.post<OrderDetail>('/api/orders', order);
  }

  /** An order with its jobs and bags. */
  order(id: number): Observable<OrderDetail> {
    return this.http.get<OrderDetail>(`/api/orders/${id}`);
  }

  /** Changes an order's customer, due time or notes. */
  updateOrder(id: number, changes: OrderUpdate): Observable<OrderDetail> {
    return this.http.patch<OrderDetail>(`/api/orders/${id}`, changes);
  }

  /** Cancels an order. */
  cancelOrder(id: number): Observable<OrderDetail> {
    return this.http.post<OrderDetail>(`/api/orders/${id}/cancel`, {});
  }

  /** Films on the shop's list, with their colours. */
  films(): Observable<FilmOption[]> {
    return this.http.get<FilmOption[]>('/api/films');
  }

  /** Fabrics on the shop's list, with their temperature limits. */
  fabrics(): Observable<FabricOption[]> {
    return this.http.get<FabricOption[]>('/api/fabrics');
  }

  /** Uploads a design file (SVG or PNG) as the multipart field `design`. */
  uploadDesign(file: File): Observable<DesignUpload> {
    const form = new FormData();
    form.append('design', file, file.name);
    return this.http.post<DesignUpload>('/api/designs', form);
  }

  /** Adds a job to an order. */
  createJob(orderId: number, job: JobCreate): Observable<JobDetail> {
    return this.http.post<JobDetail>(`/api/orders/${orderId}/jobs`, job);
  }

  /** Removes a job. */
  deleteJob(jobId: number): Observable<void> {
    return this.http.delete<void>(`/api/jobs/${jobId}`);
  }

  /** Splits a job's pieces into bags of at most `maxPieces`. */
  splitIntoBags(jobId: number, maxPieces: number): Observable<BagSummary[]> {
    return this.http.post<BagSummary[]>(`/api/jobs/${jobId}/bags`, { maxPieces });
  }

  /** Where the labels PDF for an order downloads from. */
  labelsPdfUrl(orderId: number, stock: LabelStock): string {
    return `/api/orders/${orderId}/labels.pdf?stock=${stock}`;
  }
}
