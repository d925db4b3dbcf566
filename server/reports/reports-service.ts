import { DONE_WORK } from '../../src/shared/floor/bag-counts';
import { localDate, localDaysBetween, localDaySpan } from '../../src/shared/floor/shift-window';
import { floorYield } from '../../src/shared/floor/spoil-pareto';
import type { FloorReport, ReportRow } from '../../src/shared/reports-contract';
import type { Db } from '../db/tables';
import { HttpError } from '../http/http-error';
import { ReportsRepository, SLOT_SECONDS } from './reports-repository';

/** Floor reports: good and spoiled pieces per station per local day. */
export class ReportsService {
  private readonly repository: ReportsRepository;

  constructor(db: Db) {
    this.repository = new ReportsRepository(db);
  }

  /** The report for the shop's local days `from` to `to`, both included (already checked as a valid range). */
  async floor(from: string, to: string): Promise<FloorReport> {
    const timeZone = await this.repository.timeZone();
    const { start, end } = rangeInstants(from, to, timeZone);
    const [stations, slots, reasons] = await Promise.all([this.repository.stations(), this.repository.slotTotals(start, end), this.repository.reasonTotals(start, end)]);

    const cells = new Map<string, { pieces: number; spoiled: number }>();
    let cutPieces = 0;
    for (const slot of slots) {
      const date = localDate(new Date(slot.slot * SLOT_SECONDS * 1000), timeZone);
      const key = `${date}|${slot.station_id}`;
      const cell = cells.get(key) ?? { pieces: 0, spoiled: 0 };
      if (slot.kind === 'spoil') cell.spoiled += slot.pieces;
      else cell.pieces += slot.pieces;
      if (DONE_WORK[slot.kind] === 'cut') cutPieces += slot.pieces;
      cells.set(key, cell);
    }

    const days = localDaysBetween(from, to);
    const rows: ReportRow[] = days.flatMap((date) =>
      stations.flatMap((station) => {
        const cell = cells.get(`${date}|${station.id}`);
        return cell ? [{ date, stationId: station.id, stationName: station.name, kind: station.kind, pieces: cell.pieces, spoiled: cell.spoiled }] : [];
      }),
    );
    const pieces = rows.reduce((sum, row) => sum + row.pieces, 0);
    const spoiled = rows.reduce((sum, row) => sum + row.spoiled, 0);
    // As on the board: a piece is attempted each time it is started at cut, so a remake counts again.
    const spoiledAtCut = reasons.filter((r) => r.stage === 'cut').reduce((sum, r) => sum + r.pieces, 0);

    return {
      from,
      to,
      timeZone,
      stations: stations.map(({ id, name, kind }) => ({ id, name, kind })),
      days,
      rows,
      totals: { pieces, spoiled, spoilRate: floorYield(cutPieces + spoiledAtCut, spoiled).spoilRate },
      spoilReasons: sumByReason(reasons),
    };
  }
}

function rangeInstants(from: string, to: string, timeZone: string): { start: Date; end: Date } {
  try {
    return { start: new Date(localDaySpan(from, timeZone).startAt), end: new Date(localDaySpan(to, timeZone).endAt) };
  } catch (error) {
    if (!(error instanceof RangeError)) throw error;
    throw new HttpError(500, `The shop settings cannot place the report's days: ${error.message} The owner can correct the time zone in the shop settings.`);
  }
}

function sumByReason(rows: { reason: string; pieces: number }[]): { reason: string; pieces: number }[] {
  const byReason = new Map<string, number>();
  for (const row of rows) byReason.set(row.reason, (byReason.get(row.reason) ?? 0) + row.pieces);
  return [...byReason].map(([reason, pieces]) => ({ reason, pieces })).sort((a, b) => b.pieces - a.pieces || a.reason.localeCompare(b.reason));
}
