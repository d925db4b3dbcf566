import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, type TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import { NoopAnimationsModule } from '@angular/platform-browser/animations';
import type { MailDetail, MailPage, MailSummary } from '../../shared/mail-contract';
import { MAIL_REFRESH_MS, MailOutbox } from './mail-outbox';

const SENT: MailSummary = {
  id: 7,
  kind: 'order_ready',
  to: 'hello@fernhollow-bowls.example',
  subject: 'Order 2001 is ready to collect',
  status: 'sent',
  attempts: 1,
  lastError: null,
  createdAt: '2030-03-04T10:15:00Z',
  sentAt: '2030-03-04T10:15:02Z',
  related: { orderId: 1, orderCode: '2001' },
};

const FAILED: MailSummary = {
  id: 8,
  kind: 'film_low',
  to: 'tobias@brambleyard.example',
  subject: 'Film running low: white smooth 15 in',
  status: 'failed',
  attempts: 5,
  lastError: 'The mail server refused the message: mailbox full.',
  createdAt: '2030-03-04T11:00:00Z',
  sentAt: null,
  related: { rollId: 3, rollLabel: 'R-03' },
};

function page(items: MailSummary[]): MailPage {
  return { items, total: items.length, page: 1, pageSize: 20 };
}

describe('MailOutbox', () => {
  let fixture: ComponentFixture<MailOutbox>;
  let http: HttpTestingController;

  const root = () => fixture.nativeElement as HTMLElement;
  const byTestId = <T extends HTMLElement = HTMLElement>(id: string) => root().querySelector<T>(`[data-testid="${id}"]`);
  const all = (id: string) => [...root().querySelectorAll<HTMLElement>(`[data-testid="${id}"]`)];

  async function settle(ms = 0): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve, ms));
    await fixture.whenStable();
  }

  const expectList = (): TestRequest => http.expectOne((request) => request.method === 'GET' && request.url === '/api/mail');

  async function create(refreshMs = 60_000): Promise<void> {
    TestBed.configureTestingModule({
      imports: [MailOutbox, NoopAnimationsModule],
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        importProvidersFrom(MatIconTestingModule),
        { provide: MAIL_REFRESH_MS, useValue: refreshMs },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(MailOutbox);
    await settle();
  }

  afterEach(() => {
    fixture.destroy();
    http.verify();
  });

  it('lists page 1 newest first, with each status as a word and a failed message its reason, attempts and a Retry', async () => {
    await create();
    const request = expectList();
    expect(request.request.params.toString()).toBe('page=1&pageSize=20');
    request.flush(page([FAILED, SENT]));
    await settle();

    const rows = all('mail-row');
    expect(rows).toHaveLength(2);
    expect(rows.map((row) => row.querySelector('[data-testid="mail-status"]')?.textContent?.trim())).toEqual(['Failed', 'Sent']);
    expect(rows[0]!.querySelector('[data-testid="mail-error"]')?.textContent).toContain('The mail server refused the message: mailbox full. Tried 5 of 5 times.');
    expect(rows[0]!.textContent).toContain('Film running low · to tobias@brambleyard.example');
    expect(rows[0]!.querySelector('[data-testid="mail-retry"]')).not.toBeNull();
    expect(rows[1]!.querySelector('[data-testid="mail-retry"]')).toBeNull();
  });

  it('asks the hub again with the chosen status and kind, from page 1', async () => {
    await create();
    expectList().flush(page([SENT]));
    await settle();
    const loader = TestbedHarnessEnvironment.loader(fixture);

    const status = await loader.getHarness(MatSelectHarness.with({ selector: '[data-testid="mail-status-filter"]' }));
    await status.open();
    await status.clickOptions({ text: 'Failed' });
    await settle();
    expect(expectList().request.params.toString()).toBe('page=1&pageSize=20&status=failed');

    const kind = await loader.getHarness(MatSelectHarness.with({ selector: '[data-testid="mail-kind-filter"]' }));
    await kind.open();
    await kind.clickOptions({ text: 'Shift summary' });
    await settle();
    const request = expectList();
    expect(request.request.params.toString()).toBe('page=1&pageSize=20&status=failed&kind=shift_summary');
    request.flush(page([]));
    await settle();
    expect(byTestId('mail-empty')?.textContent).toContain('No messages match.');
  });

  it('opens a message in a sandboxed frame from its own HTML address, with a toggle to the plain text', async () => {
    await create();
    expectList().flush(page([SENT]));
    await settle();

    byTestId<HTMLButtonElement>('mail-open')!.click();
    await settle();
    const detail: MailDetail = { ...SENT, text: 'Hello,\nyour order 2001 is ready to collect.' };
    http.expectOne('/api/mail/7').flush(detail);
    await settle();

    const frame = byTestId<HTMLIFrameElement>('mail-html')!;
    expect(frame.getAttribute('sandbox')).toBe('');
    expect(frame.getAttribute('src')).toBe('/api/mail/7/html');

    byTestId<HTMLButtonElement>('mail-view-text')!.click();
    await settle();
    expect(byTestId('mail-html')).toBeNull();
    expect(byTestId('mail-text')!.textContent).toBe('Hello,\nyour order 2001 is ready to collect.');
  });

  it('shows the hub sentence when a retry is refused, and reloads the list', async () => {
    await create();
    expectList().flush(page([FAILED]));
    await settle();

    byTestId<HTMLButtonElement>('mail-retry')!.click();
    await settle();
    http.expectOne({ method: 'POST', url: '/api/mail/8/retry' })
      .flush({ error: 'This message was already sent; there is nothing to retry.' }, { status: 409, statusText: 'Conflict' });
    await settle();

    expect(byTestId('mail-action-problem')!.textContent).toContain('This message was already sent; there is nothing to retry.');
    expectList().flush(page([{ ...FAILED, status: 'sent', sentAt: '2030-03-04T11:05:00Z' }]));
    await settle();
    expect(byTestId('mail-status')!.textContent?.trim()).toBe('Sent');
  });

  it('sends the shift summary now and says where it went', async () => {
    await create();
    expectList().flush(page([]));
    await settle();

    byTestId<HTMLButtonElement>('mail-send-summary')!.click();
    await settle();
    const summary: MailSummary = { ...SENT, id: 9, kind: 'shift_summary', to: 'maren@brambleyard.example', subject: 'Shift summary', related: { shiftDate: '2030-03-04' } };
    const request = http.expectOne({ method: 'POST', url: '/api/mail/shift-summary' });
    request.flush(summary);
    await settle();

    expect(byTestId('mail-notice')!.textContent).toContain('The shift summary was sent to maren@brambleyard.example.');
    expectList().flush(page([summary]));
    await settle();
    expect(all('mail-row')).toHaveLength(1);
  });

  it('asks the hub again on its own after the refresh interval', async () => {
    await create(40);
    // On a busy machine the first refresh may already have gone out and replaced the first load.
    const first = http.match((request) => request.method === 'GET' && request.url === '/api/mail').filter((request) => !request.cancelled);
    expect(first).toHaveLength(1);
    first[0]!.flush(page([SENT]));

    await settle(100);
    fixture.destroy();
    const again = http.match((request) => request.method === 'GET' && request.url === '/api/mail');
    expect(again.length).toBeGreaterThanOrEqual(1);
  });

  it('asks the hub again when the window regains focus and shows the new page', async () => {
    await create();
    expectList().flush(page([SENT]));
    await settle();

    window.dispatchEvent(new Event('focus'));
    await settle();
    expectList().flush(page([FAILED, SENT]));
    await settle();
    expect(all('mail-row')).toHaveLength(2);
  });
});
