import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { MailDetail, MailKind, MailPage, MailStatus, MailSummary } from '../../shared/mail-contract';

/** What the Mail outbox asks for: filters (empty for all) and the page. */
export interface MailQuery {
  status: MailStatus | '';
  kind: MailKind | '';
  page: number;
  pageSize: number;
}

/** Hub calls of the Mail outbox. */
@Injectable({ providedIn: 'root' })
export class MailApi {
  private readonly http = inject(HttpClient);

  /** One page of messages, newest first. */
  list(query: MailQuery): Observable<MailPage> {
    const params: Record<string, string | number> = { page: query.page, pageSize: query.pageSize };
    if (query.status) params['status'] = query.status;
    if (query.kind) params['kind'] = query.kind;
    return this.http.get<MailPage>('/api/mail', { params });
  }

  /** One message with its plain-text part. */
  detail(id: number): Observable<MailDetail> {
    return this.http.get<MailDetail>(`/api/mail/${id}`);
  }

  /** Sends a failed message again. */
  retry(id: number): Observable<MailSummary> {
    return this.http.post<MailSummary>(`/api/mail/${id}/retry`, {});
  }

  /** Sends the summary of the shift so far now. */
  sendShiftSummary(): Observable<MailSummary> {
    return this.http.post<MailSummary>('/api/mail/shift-summary', {});
  }
}

/** The same-origin address of a message's HTML part; null for anything but a whole positive id. */
export function mailHtmlPath(id: number): string | null {
  return Number.isSafeInteger(id) && id > 0 ? `/api/mail/${id}/html` : null;
}
