import {
  BarController,
  BarElement,
  CategoryScale,
  Legend,
  LineController,
  LineElement,
  LinearScale,
  PointElement,
  Tooltip,
  type PointStyle,
} from 'chart.js';
import type { ChartOptions, ChartType } from 'chart.js';
import { provideCharts } from 'ng2-charts';

/** Where the board is shown: the lead's light screen, or a dark wall across the room. */
export type BoardMode = 'lead' | 'wall';

/** Registers only the chart.js parts the board draws (bars, lines, two linear axes, legend, tooltip). */
export function provideBoardCharts() {
  return provideCharts({
    registerables: [BarController, BarElement, LineController, LineElement, PointElement, CategoryScale, LinearScale, Legend, Tooltip],
  });
}

/** Colours and sizes a chart needs for one mode; canvas pixels cannot read CSS variables. */
export interface ChartLook {
  series: readonly string[];
  /** Line dashes and point shapes per series, so stations differ by more than colour. */
  dashes: readonly number[][];
  points: readonly PointStyle[];
  ink: string;
  grid: string;
  bar: string;
  line: string;
  fontPx: number;
}

// Tones from Dwell's ink-teal and heat-orange palettes (src/styles.scss): dark tones on the light
// screen, light tones on the dark wall, alternating hues so neighbours in the legend differ.
const LOOKS: Readonly<Record<BoardMode, ChartLook>> = {
  lead: {
    series: ['#0c4e59', '#c05a0e', '#487f8b', '#773300', '#4e6267', '#e07229'],
    dashes: [[], [12, 6], [4, 4], [16, 4, 4, 4], [2, 6], [8, 8]],
    points: ['circle', 'rect', 'triangle', 'rectRot', 'star', 'crossRot'],
    ink: '#191c1d',
    grid: '#dbe4e6',
    bar: '#c05a0e',
    line: '#0c4e59',
    fontPx: 16,
  },
  wall: {
    series: ['#98cfdc', '#ffb68e', '#d5f7ff', '#ff8d46', '#b5cad0', '#ffdbca'],
    dashes: [[], [14, 7], [5, 5], [18, 5, 5, 5], [3, 7], [10, 10]],
    points: ['circle', 'rect', 'triangle', 'rectRot', 'star', 'crossRot'],
    ink: '#e1e3e3',
    grid: '#353d3f',
    bar: '#ff8d46',
    line: '#98cfdc',
    fontPx: 24,
  },
};

/** The chart look for a mode. */
export function chartLook(mode: BoardMode): ChartLook {
  return LOOKS[mode];
}

/** The font every board chart writes in, at the mode's size. */
export function chartFont(look: ChartLook) {
  return { size: look.fontPx, family: "'Atkinson Hyperlegible', system-ui, sans-serif" };
}

/** What every board chart shares: fills its box, never animates, legend below, tooltips for the lead only. */
export function boardChartBase<T extends ChartType>(mode: BoardMode): ChartOptions<T> {
  const look = chartLook(mode);
  const font = chartFont(look);
  return {
    responsive: true,
    maintainAspectRatio: false,
    // Redrawn on every event: movement would distract more than it explains.
    animation: false,
    color: look.ink,
    plugins: {
      legend: { position: 'bottom', labels: { usePointStyle: true, color: look.ink, font } },
      tooltip: { enabled: mode === 'lead' },
    },
  } as ChartOptions<T>;
}
