import type { FloorReport } from '../../shared/reports-contract';

/** Pieces finished and spoiled, in one cell or total. */
export interface WorkCount {
  pieces: number;
  spoiled: number;
}

/** One day of the report table: a cell per station, in the report's station order, and the day's total. */
export interface ReportDay {
  date: string;
  cells: WorkCount[];
  total: WorkCount;
}

/** The day × station table with its column totals. */
export interface ReportTable {
  stations: FloorReport['stations'];
  days: ReportDay[];
  stationTotals: WorkCount[];
  total: WorkCount;
}

/** Lays the report's station-days out as a table, zero where a station had no work that day. */
export function reportTable(report: FloorReport): ReportTable {
  const column = new Map(report.stations.map((station, i) => [station.id, i]));
  const byDay = new Map(report.days.map((date) => [date, report.stations.map(() => ({ pieces: 0, spoiled: 0 }))]));
  for (const row of report.rows) {
    const cell = byDay.get(row.date)?.[column.get(row.stationId) ?? -1];
    if (!cell) continue;
    cell.pieces += row.pieces;
    cell.spoiled += row.spoiled;
  }
  const days = report.days.map((date) => {
    const cells = byDay.get(date)!;
    return { date, cells, total: sum(cells) };
  });
  const stationTotals = report.stations.map((_, i) => sum(days.map((day) => day.cells[i]!)));
  return { stations: report.stations, days, stationTotals, total: sum(stationTotals) };
}

function sum(counts: readonly WorkCount[]): WorkCount {
  return counts.reduce((a, b) => ({ pieces: a.pieces + b.pieces, spoiled: a.spoiled + b.spoiled }), { pieces: 0, spoiled: 0 });
}
