import type { ChartConfiguration } from 'chart.js';
import type { StationKind } from '../../shared/names';
import type { ReportTable } from './report-table';

/** The report chart: one bar dataset per station plus the spoiled line; the type is 'bar' with a line mixed in. */
export type ReportChart = ChartConfiguration<'bar' | 'line', number[], string>;

// The stage tones of the Orders progress bar, so a station reads the same everywhere.
const KIND_COLOURS: Readonly<Record<StationKind, readonly string[]>> = {
  cut: ['#98cfdc', '#c3e4ec'],
  weed: ['#487f8b', '#7aa9b3'],
  press: ['#e07229', '#f0a675'],
  pack: ['#0c4e59', '#3d7c87'],
};
const SPOILED_COLOUR = '#b3261e';

/** Stacked bars of good pieces per day by station, and the spoiled pieces per day as a dashed line on their own axis. */
export function reportChart(table: ReportTable, dayLabel: (date: string) => string): ReportChart {
  const seen: Partial<Record<StationKind, number>> = {};
  const bars = table.stations.map((station, i) => {
    const nth = seen[station.kind] ?? 0;
    seen[station.kind] = nth + 1;
    const tones = KIND_COLOURS[station.kind];
    return {
      type: 'bar' as const,
      label: station.name,
      data: table.days.map((day) => day.cells[i]!.pieces),
      backgroundColor: tones[nth % tones.length],
      borderColor: '#1b1c1c',
      borderWidth: 1,
      stack: 'pieces',
      yAxisID: 'y',
    };
  });
  const spoiled = {
    type: 'line' as const,
    label: 'Spoiled',
    data: table.days.map((day) => day.total.spoiled),
    borderColor: SPOILED_COLOUR,
    backgroundColor: SPOILED_COLOUR,
    borderDash: [8, 6],
    borderWidth: 3,
    pointStyle: 'triangle' as const,
    pointRadius: 6,
    yAxisID: 'spoiled',
  };
  return {
    type: 'bar',
    data: { labels: table.days.map((day) => dayLabel(day.date)), datasets: [...bars, spoiled] },
    options: {
      responsive: true,
      maintainAspectRatio: false,
      animation: false,
      interaction: { mode: 'index', intersect: false },
      plugins: { legend: { position: 'bottom', labels: { font: { size: 16 }, usePointStyle: true } } },
      scales: {
        x: { stacked: true, ticks: { font: { size: 14 } } },
        y: { stacked: true, beginAtZero: true, title: { display: true, text: 'Good pieces', font: { size: 14 } }, ticks: { precision: 0 } },
        spoiled: { position: 'right', beginAtZero: true, grid: { drawOnChartArea: false }, title: { display: true, text: 'Spoiled', font: { size: 14 } }, ticks: { precision: 0 } },
      },
    },
  };
}
