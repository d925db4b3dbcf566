import type { StationKind } from './names';

/** One station's work on one day (the shop's time zone). */
export interface ReportRow {
  /** YYYY-MM-DD */
  date: string;
  stationId: number;
  stationName: string;
  kind: StationKind;
  /** Good pieces finished (done events). */
  pieces: number;
  /** Pieces reported spoiled at this station. */
  spoiled: number;
}

/** GET /api/reports/floor?from=YYYY-MM-DD&to=YYYY-MM-DD (owner, lead); both days included, at most REPORT_MAX_DAYS. */
export interface FloorReport {
  from: string;
  to: string;
  timeZone: string;
  /** Every station, also those with no work in the range. */
  stations: { id: number; name: string; kind: StationKind }[];
  /** Days in the range, in order, also those with no work. */
  days: string[];
  /** Only station-days with work or spoils. */
  rows: ReportRow[];
  totals: { pieces: number; spoiled: number; spoilRate: number | null };
  spoilReasons: { reason: string; pieces: number }[];
}

/** GET /api/reports/floor.csv?from&to gives the rows as CSV (date, station, kind, pieces, spoiled). */
export const REPORT_MAX_DAYS = 366;
