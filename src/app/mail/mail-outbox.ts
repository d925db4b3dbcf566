import { ChangeDetectionStrategy, Component, DestroyRef, InjectionToken, computed, inject, signal } from '@angular/core';
import { DatePipe, DOCUMENT } from '@angular/common';
import { takeUntilDestroyed, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { DomSanitizer } from '@angular/platform-browser';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatSelectModule } from '@angular/material/select';
import { catchError, firstValueFrom, interval, map, of, startWith, switchMap } from 'rxjs';
import { MAIL_KINDS, MAIL_MAX_ATTEMPTS, MAIL_STATUSES, type MailDetail, type MailKind, type MailPage, type MailStatus, type MailSummary } from '../../shared/mail-contract';
import { apiErrorSentence } from '../core/api-error';
import { MailApi, type MailQuery, mailHtmlPath } from './mail-api';
import { MAIL_KIND_LABELS, MAIL_STATUS_DISPLAY } from './mail-display';

/** How often the outbox asks the hub again while it is open. */
export const MAIL_REFRESH_MS = new InjectionToken<number>('MAIL_REFRESH_MS', { providedIn: 'root', factory: () => 15_000 });

type DetailState =
  | { status: 'closed' }
  | { status: 'loading' }
  | { status: 'loaded'; message: MailDetail }
  | { status: 'failed'; sentence: string };

/** Mail outbox: every message Dwell sent or is trying to send, with the message as the customer saw it and a Retry. */
@Component({
  selector: 'dw-mail-outbox',
  imports: [DatePipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatPaginatorModule, MatSelectModule],
  templateUrl: './mail-outbox.html',
  styleUrl: './mail-outbox.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '(window:focus)': 'refresh()', '(document:visibilitychange)': 'visibilityChanged()' },
})
export class MailOutbox {
  private readonly api = inject(MailApi);
  private readonly sanitizer = inject(DomSanitizer);
  private readonly document = inject(DOCUMENT);

  protected readonly kinds = MAIL_KINDS;
  protected readonly statuses = MAIL_STATUSES;
  protected readonly kindLabels = MAIL_KIND_LABELS;
  protected readonly statusDisplay = MAIL_STATUS_DISPLAY;
  protected readonly maxAttempts = MAIL_MAX_ATTEMPTS;

  protected readonly query = signal<MailQuery>({ status: '', kind: '', page: 1, pageSize: 20 });
  private readonly refreshes = signal(0);
  /** The last page the hub sent: kept on screen while a refresh is under way. */
  protected readonly page = signal<MailPage | null>(null);
  protected readonly listProblem = signal<string | null>(null);
  protected readonly rows = computed(() => this.page()?.items ?? []);

  protected readonly openId = signal<number | null>(null);
  protected readonly view = signal<'html' | 'text'>('html');
  protected readonly detail = toSignal(
    toObservable(this.openId).pipe(
      switchMap((id) => id === null
        ? of<DetailState>({ status: 'closed' })
        : this.api.detail(id).pipe(
          map((message): DetailState => ({ status: 'loaded', message })),
          catchError((error: unknown) => of<DetailState>({ status: 'failed', sentence: apiErrorSentence(error, 'The message could not be opened.') })),
          startWith<DetailState>({ status: 'loading' }),
        )),
    ),
    { initialValue: { status: 'closed' } as DetailState },
  );
  protected readonly message = computed(() => {
    const state = this.detail();
    return state.status === 'loaded' ? state.message : null;
  });
  protected readonly detailProblem = computed(() => {
    const state = this.detail();
    return state.status === 'failed' ? state.sentence : null;
  });
  /**
   * The HTML part for the sandboxed frame. Trusting a resource URL is safe only because this is
   * the hub's own same-origin path, built here from a whole-number id, never text from the message.
   */
  protected readonly htmlSrc = computed(() => {
    const id = this.openId();
    const path = id === null ? null : mailHtmlPath(id);
    return path ? this.sanitizer.bypassSecurityTrustResourceUrl(path) : null;
  });

  protected readonly busy = signal<'summary' | number | null>(null);
  protected readonly notice = signal<string | null>(null);
  protected readonly actionProblem = signal<string | null>(null);

  constructor() {
    const destroyRef = inject(DestroyRef);
    toObservable(computed(() => ({ query: this.query(), refresh: this.refreshes() })))
      .pipe(
        switchMap(({ query }) => this.api.list(query).pipe(
          map((page) => ({ page, problem: null })),
          catchError((error: unknown) => of({ page: null, problem: apiErrorSentence(error, 'The mail outbox could not be loaded.') })),
        )),
        takeUntilDestroyed(destroyRef),
      )
      .subscribe(({ page, problem }) => {
        if (page) this.page.set(page);
        this.listProblem.set(problem);
      });
    interval(inject(MAIL_REFRESH_MS)).pipe(takeUntilDestroyed(destroyRef)).subscribe(() => this.refresh());
  }

  /** Asks the hub for the current page again. */
  protected refresh(): void {
    this.refreshes.update((n) => n + 1);
  }

  protected visibilityChanged(): void {
    if (this.document.visibilityState === 'visible') this.refresh();
  }

  protected statusChosen(status: MailStatus | ''): void {
    this.query.update((query) => ({ ...query, status, page: 1 }));
  }

  protected kindChosen(kind: MailKind | ''): void {
    this.query.update((query) => ({ ...query, kind, page: 1 }));
  }

  protected pageChanged(event: PageEvent): void {
    this.query.update((query) => ({ ...query, page: event.pageIndex + 1, pageSize: event.pageSize }));
  }

  protected openMessage(mail: MailSummary): void {
    this.view.set('html');
    this.openId.set(mail.id);
  }

  protected closeMessage(): void {
    this.openId.set(null);
  }

  /** Sends a failed message again; the hub's sentence shows when it cannot (already sent, for one). */
  protected async retry(mail: MailSummary): Promise<void> {
    await this.act(mail.id, async () => {
      const after = await firstValueFrom(this.api.retry(mail.id));
      return after.status === 'sent'
        ? `"${after.subject}" was sent to ${after.to}.`
        : after.status === 'failed'
          ? `"${after.subject}" failed again: ${after.lastError ?? 'no reason given'}`
          : `"${after.subject}" is waiting to be sent to ${after.to}.`;
    });
  }

  /** Sends the summary of the shift so far now. */
  protected async sendShiftSummary(): Promise<void> {
    await this.act('summary', async () => {
      const mail = await firstValueFrom(this.api.sendShiftSummary());
      return mail.status === 'sent' ? `The shift summary was sent to ${mail.to}.` : `The shift summary to ${mail.to} is ${MAIL_STATUS_DISPLAY[mail.status].label.toLowerCase()}.`;
    });
  }

  protected attemptsText(mail: MailSummary): string {
    return `Tried ${mail.attempts} of ${MAIL_MAX_ATTEMPTS} times`;
  }

  private async act(what: 'summary' | number, work: () => Promise<string>): Promise<void> {
    if (this.busy() !== null) return;
    this.busy.set(what);
    this.notice.set(null);
    this.actionProblem.set(null);
    try {
      this.notice.set(await work());
    } catch (error) {
      this.actionProblem.set(apiErrorSentence(error, 'That did not work. Try again.'));
    } finally {
      this.busy.set(null);
      this.refresh();
    }
  }
}
