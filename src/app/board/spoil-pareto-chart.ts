import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ChartData, ChartOptions } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import type { BoardSpoilReason } from '../../shared/board-contract';
import { boardChartBase, chartFont, chartLook, provideBoardCharts, type BoardMode } from './board-charts';
import { percent } from './board-format';

/** Spoiled pieces by reason, largest first, with the running share as a line: the few reasons that matter most. */
@Component({
  selector: 'dw-spoil-pareto-chart',
  imports: [BaseChartDirective],
  providers: [provideBoardCharts()],
  templateUrl: './spoil-pareto-chart.html',
  styleUrl: './board-chart.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpoilParetoChart {
  readonly reasons = input.required<readonly BoardSpoilReason[]>();
  readonly mode = input<BoardMode>('lead');

  protected readonly percent = percent;

  protected readonly data = computed((): ChartData<'bar' | 'line', number[], string> => {
    const look = chartLook(this.mode());
    const reasons = this.reasons();
    return {
      labels: reasons.map((reason) => reason.reason),
      datasets: [
        {
          type: 'bar',
          label: 'Pieces spoiled',
          data: reasons.map((reason) => reason.pieces),
          backgroundColor: look.bar,
          yAxisID: 'y',
          order: 2,
        },
        {
          type: 'line',
          label: 'Running share (%)',
          data: reasons.map((reason) => Math.round(reason.cumulativeShare * 1000) / 10),
          borderColor: look.line,
          backgroundColor: look.line,
          borderWidth: look.fontPx / 5,
          pointRadius: look.fontPx / 3,
          pointStyle: 'rectRot',
          yAxisID: 'share',
          order: 1,
        },
      ],
    };
  });

  protected readonly options = computed((): ChartOptions<'bar' | 'line'> => {
    const look = chartLook(this.mode());
    const font = chartFont(look);
    return {
      ...boardChartBase(this.mode()),
      scales: {
        x: { ticks: { color: look.ink, font }, grid: { display: false } },
        y: {
          beginAtZero: true,
          ticks: { color: look.ink, font, precision: 0 },
          grid: { color: look.grid },
          title: { display: true, text: 'pieces', color: look.ink, font },
        },
        share: {
          position: 'right',
          min: 0,
          max: 100,
          ticks: { color: look.ink, font, callback: (value) => `${value} %` },
          grid: { display: false },
        },
      },
    };
  });

  /** What the canvas says to a screen reader: the reasons, largest first. */
  protected readonly summary = computed(() => {
    const reasons = this.reasons();
    if (reasons.length === 0) return 'Spoiled pieces by reason: none this shift.';
    return `Spoiled pieces by reason, largest first: ${reasons.map((r) => `${r.reason} ${r.pieces}`).join(', ')}.`;
  });
}
