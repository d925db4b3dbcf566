import { ChangeDetectionStrategy, Component, InjectionToken, computed, inject, signal } from '@angular/core';
import { PercentPipe } from '@angular/common';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { BaseChartDirective } from 'ng2-charts';
import { provideBoardCharts } from '../board/board-charts';
import { format, parseISO } from 'date-fns';
import { catchError, map, of, startWith, switchMap } from 'rxjs';
import type { FloorReport as FloorReportData } from '../../shared/reports-contract';
import { apiErrorSentence, hasStatus } from '../core/api-error';
import { reportChart } from './report-chart';
import { QUICK_RANGES, QUICK_RANGE_LABELS, type QuickRange, quickRange } from './report-range';
import { reportTable } from './report-table';
import { type DayRange, ReportsApi, floorCsvUrl } from './reports-api';

/** Today, for the quick picks; specs give a fixed day. */
export const REPORT_TODAY = new InjectionToken<() => Date>('REPORT_TODAY', { providedIn: 'root', factory: () => () => new Date() });

type ReportState =
  | { status: 'loading' }
  | { status: 'loaded'; report: FloorReportData }
  | { status: 'failed'; sentence: string; badRange: boolean };

const dayLabel = (date: string) => format(parseISO(date), 'EEE d MMM');

/** Reports: pieces and spoils per station and day over a range, as a chart, a table and a CSV download. */
@Component({
  selector: 'dw-floor-report',
  imports: [PercentPipe, BaseChartDirective, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule],
  templateUrl: './floor-report.html',
  styleUrl: './floor-report.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  // The same chart.js parts as the floor board, registered by the same function and only in lazy screens,
  // so chart.js stays out of the start-up bundle the station tablets load.
  providers: [provideBoardCharts()],
})
export class FloorReport {
  private readonly api = inject(ReportsApi);
  private readonly today = inject(REPORT_TODAY);

  protected readonly picks = QUICK_RANGES;
  protected readonly pickLabels = QUICK_RANGE_LABELS;
  protected readonly dayLabel = dayLabel;

  protected readonly range = signal<DayRange>(quickRange('last7', this.today()));
  protected readonly pick = signal<QuickRange | null>('last7');
  /** A sentence about the date fields found before asking the hub (an empty field). */
  protected readonly fieldProblem = signal<string | null>(null);

  protected readonly state = toSignal(
    toObservable(this.range).pipe(
      switchMap((range) => this.api.floor(range).pipe(
        map((report): ReportState => ({ status: 'loaded', report })),
        catchError((error: unknown) => of<ReportState>({
          status: 'failed',
          sentence: apiErrorSentence(error, 'The report could not be loaded.'),
          badRange: hasStatus(error, 400),
        })),
        startWith<ReportState>({ status: 'loading' }),
      )),
    ),
    { initialValue: { status: 'loading' } as ReportState },
  );
  protected readonly report = computed(() => {
    const state = this.state();
    return state.status === 'loaded' ? state.report : null;
  });
  /** The hub's sentence about the range (400), shown beside the date fields. */
  protected readonly rangeProblem = computed(() => {
    const state = this.state();
    return this.fieldProblem() ?? (state.status === 'failed' && state.badRange ? state.sentence : null);
  });
  protected readonly loadProblem = computed(() => {
    const state = this.state();
    return state.status === 'failed' && !state.badRange ? state.sentence : null;
  });
  protected readonly table = computed(() => {
    const report = this.report();
    return report ? reportTable(report) : null;
  });
  protected readonly chart = computed(() => {
    const table = this.table();
    return table ? reportChart(table, dayLabel) : null;
  });
  protected readonly reasonsTop = computed(() => Math.max(1, ...(this.report()?.spoilReasons ?? []).map((r) => r.pieces)));
  protected readonly csvUrl = computed(() => floorCsvUrl(this.range()));

  protected pickChosen(pick: QuickRange): void {
    this.fieldProblem.set(null);
    this.pick.set(pick);
    this.range.set(quickRange(pick, this.today()));
  }

  /** A date field changed: the report follows at once; an emptied field is named instead. */
  protected dayChanged(which: 'from' | 'to', value: string): void {
    if (!value) {
      this.fieldProblem.set(which === 'from' ? 'Choose the first day of the report.' : 'Choose the last day of the report.');
      return;
    }
    this.fieldProblem.set(null);
    this.pick.set(null);
    this.range.update((range) => ({ ...range, [which]: value }));
  }
}
