import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ChartData, ChartOptions } from 'chart.js';
import { BaseChartDirective } from 'ng2-charts';
import type { BoardHourly } from '../../shared/board-contract';
import { boardChartBase, chartFont, chartLook, provideBoardCharts, type BoardMode } from './board-charts';
import { clock } from './board-format';

/** Good pieces per station in each hour of the shift, as lines, with a table of the same numbers. */
@Component({
  selector: 'dw-station-rates-chart',
  imports: [BaseChartDirective],
  providers: [provideBoardCharts()],
  templateUrl: './station-rates-chart.html',
  styleUrl: './board-chart.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationRatesChart {
  readonly hourly = input.required<BoardHourly>();
  readonly mode = input<BoardMode>('lead');

  protected readonly hourLabels = computed(() => this.hourly().hours.map((hour) => clock(hour)));
  protected readonly hasData = computed(() => this.hourly().hours.length > 0 && this.hourly().stations.length > 0);

  protected readonly data = computed((): ChartData<'line', number[], string> => {
    const look = chartLook(this.mode());
    return {
      labels: this.hourLabels(),
      datasets: this.hourly().stations.map((station, index) => {
        const colour = look.series[index % look.series.length]!;
        return {
          label: station.name,
          data: station.pieces,
          borderColor: colour,
          backgroundColor: colour,
          borderDash: look.dashes[index % look.dashes.length],
          pointStyle: look.points[index % look.points.length],
          pointRadius: look.fontPx / 3,
          borderWidth: look.fontPx / 5,
          tension: 0,
        };
      }),
    };
  });

  protected readonly options = computed((): ChartOptions<'line'> => {
    const look = chartLook(this.mode());
    const font = chartFont(look);
    return {
      ...boardChartBase(this.mode()),
      scales: {
        // Upright hour labels, every second or third one when they would crowd: slanted text reads badly from afar.
        x: { ticks: { color: look.ink, font, maxRotation: 0, autoSkipPadding: look.fontPx / 2 }, grid: { color: look.grid } },
        y: {
          beginAtZero: true,
          ticks: { color: look.ink, font, precision: 0 },
          grid: { color: look.grid },
          title: { display: true, text: 'pieces in the hour', color: look.ink, font },
        },
      },
    };
  });

  /** What the canvas says to a screen reader: the latest hour for each station. */
  protected readonly summary = computed(() => {
    const { hours, stations } = this.hourly();
    if (hours.length === 0) return 'Pieces per hour by station: no hours of this shift yet.';
    const last = hours.length - 1;
    const latest = stations.map((station) => `${station.name} ${station.pieces[last] ?? 0}`).join(', ');
    return `Pieces per hour by station since ${clock(hours[0]!)}. Hour from ${clock(hours[last]!)}: ${latest}.`;
  });
}
