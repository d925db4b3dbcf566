import type { ReportRow } from '../../src/shared/reports-contract';

/** The CSV's columns, in order. */
export const REPORT_CSV_HEADER = ['date', 'station', 'kind', 'pieces', 'spoiled'] as const;

// A spreadsheet runs a cell that starts with one of these as a formula; a leading apostrophe keeps it text.
const FORMULA_START = /^[=+\-@\t\r]/;

/** One text field as RFC 4180 writes it: quoted when it holds a comma, quote or line break, quotes doubled. */
export function csvField(value: string): string {
  const safe = FORMULA_START.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}

/** The report rows as an RFC 4180 CSV: a header line, CRLF after every record. */
export function reportCsv(rows: readonly ReportRow[]): string {
  const lines = [REPORT_CSV_HEADER.join(','), ...rows.map((row) => [row.date, csvField(row.stationName), row.kind, String(row.pieces), String(row.spoiled)].join(','))];
  return lines.map((line) => `${line}\r\n`).join('');
}
