import { ComponentFixture, TestBed } from '@angular/core/testing';
import { importProvidersFrom, provideZonelessChangeDetection } from '@angular/core';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, type TestRequest, provideHttpClientTesting } from '@angular/common/http/testing';
import { MatIconTestingModule } from '@angular/material/icon/testing';
import type { FloorReport as FloorReportData } from '../../shared/reports-contract';
import { FloorReport, REPORT_TODAY } from './floor-report';

/** Three invented days at Bramble Yard: two stations, one idle day. */
const REPORT: FloorReportData = {
  from: '2026-03-03',
  to: '2026-03-05',
  timeZone: 'Europe/London',
  stations: [
    { id: 1, name: 'Weed 1', kind: 'weed' },
    { id: 2, name: 'Press 1', kind: 'press' },
  ],
  days: ['2026-03-03', '2026-03-04', '2026-03-05'],
  rows: [
    { date: '2026-03-03', stationId: 1, stationName: 'Weed 1', kind: 'weed', pieces: 40, spoiled: 2 },
    { date: '2026-03-03', stationId: 2, stationName: 'Press 1', kind: 'press', pieces: 36, spoiled: 1 },
    { date: '2026-03-05', stationId: 2, stationName: 'Press 1', kind: 'press', pieces: 24, spoiled: 0 },
  ],
  totals: { pieces: 100, spoiled: 3, spoilRate: 3 / 103 },
  spoilReasons: [{ reason: 'Film lifted', pieces: 2 }, { reason: 'Wrong size', pieces: 1 }],
};

describe('FloorReport', () => {
  let fixture: ComponentFixture<FloorReport>;
  let http: HttpTestingController;

  const root = () => fixture.nativeElement as HTMLElement;
  const byTestId = <T extends HTMLElement = HTMLElement>(id: string) => root().querySelector<T>(`[data-testid="${id}"]`);
  const text = (element: Element | null | undefined) => element?.textContent?.replace(/\s+/g, ' ').trim();
  const cell = (element: Element) => (element.children.length ? [...element.children].map(text).filter(Boolean).join(' ') : text(element));
  const expectReport = (): TestRequest => http.expectOne((request) => request.method === 'GET' && request.url === '/api/reports/floor');

  async function settle(): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve, 0));
    await fixture.whenStable();
  }

  beforeEach(async () => {
    jest.spyOn(console, 'error').mockImplementation(() => undefined); // jsdom has no canvas; the chart says so and draws nothing.
    TestBed.configureTestingModule({
      imports: [FloorReport],
      providers: [
        provideZonelessChangeDetection(),
        provideHttpClient(),
        provideHttpClientTesting(),
        importProvidersFrom(MatIconTestingModule),
        { provide: REPORT_TODAY, useValue: () => new Date(2026, 2, 5, 16, 0) },
      ],
    });
    http = TestBed.inject(HttpTestingController);
    fixture = TestBed.createComponent(FloorReport);
    await settle();
  });

  afterEach(() => {
    http.verify();
    jest.restoreAllMocks();
  });

  it('loads the last 7 days by default and links the CSV download to the same range', async () => {
    const request = expectReport();
    expect(request.request.params.toString()).toBe('from=2026-02-27&to=2026-03-05');
    request.flush(REPORT);
    await settle();

    const link = byTestId<HTMLAnchorElement>('report-csv')!;
    expect(link.getAttribute('href')).toBe('/api/reports/floor.csv?from=2026-02-27&to=2026-03-05');
    expect(link.hasAttribute('download')).toBe(true);
    expect(byTestId('report-from')!.getAttribute('value') ?? byTestId<HTMLInputElement>('report-from')!.value).toBe('2026-02-27');
  });

  it('lays the report out day by station with day and station totals that add up', async () => {
    expectReport().flush(REPORT);
    await settle();

    const days = [...root().querySelectorAll('[data-testid="report-day"]')].map((row) => [...row.children].map(cell));
    expect(days).toEqual([
      ['Tue 3 Mar', '40 2 spoiled', '36 1 spoiled', '76 3 spoiled'],
      ['Wed 4 Mar', '0', '0', '0'],
      ['Thu 5 Mar', '0', '24', '24'],
    ]);
    expect([...byTestId('report-total-row')!.children].map(cell)).toEqual(['Total', '40 2 spoiled', '60 1 spoiled', '100 3 spoiled']);
    expect([...byTestId('report-totals')!.children].map(cell)).toEqual(['Good pieces 100', 'Spoiled 3', 'Spoil rate 2.9%']);
    expect([...root().querySelectorAll('[data-testid="report-reasons"] li')].map(cell)).toEqual(['Film lifted 2 pieces', 'Wrong size 1 piece']);
  });

  it('asks for this week from Monday when the quick pick is tapped, and moves the CSV link with it', async () => {
    expectReport().flush(REPORT);
    await settle();

    byTestId<HTMLButtonElement>('report-pick-thisWeek')!.click();
    await settle();
    expect(expectReport().request.params.toString()).toBe('from=2026-03-02&to=2026-03-05');
    expect(byTestId<HTMLAnchorElement>('report-csv')!.getAttribute('href')).toBe('/api/reports/floor.csv?from=2026-03-02&to=2026-03-05');
  });

  it('shows the hub sentence for a bad range next to the date fields', async () => {
    expectReport().flush(REPORT);
    await settle();

    const from = byTestId<HTMLInputElement>('report-from')!;
    from.value = '2026-03-09';
    from.dispatchEvent(new Event('change'));
    await settle();
    const request = expectReport();
    expect(request.request.params.toString()).toBe('from=2026-03-09&to=2026-03-05');
    request.flush(
      { error: 'The report range is not valid.', details: [{ path: ['to'], message: 'The last day (2026-03-05) is before the first day (2026-03-09): swap them.' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle();

    const problem = byTestId('report-range-problem')!;
    expect(problem.textContent).toContain('The last day (2026-03-05) is before the first day (2026-03-09): swap them.');
    expect(problem.closest('.days')).toBe(root().querySelector('.days'));
    expect(from.getAttribute('aria-describedby')).toBe('report-range-problem');
    expect(byTestId('report-table')).toBeNull();
  });
});
