import type { EventKind, StationKind } from '../../src/shared/names';
import type { Db, StationRow } from '../db/tables';

/** Pieces one station reported of one event kind within one 15-minute slot (slot = epoch seconds / 900). */
export interface SlotTotalRow {
  station_id: number;
  kind: EventKind;
  slot: number;
  pieces: number;
}

/** Pieces spoiled for one reason at one stage. */
export interface ReasonTotalRow {
  reason: string;
  stage: StationKind;
  pieces: number;
}

/** The event kinds a report counts: good pieces done and pieces spoiled. */
const REPORTED_KINDS: readonly EventKind[] = ['cut_done', 'weed_done', 'press_done', 'pack_done', 'spoil'];

/** Seconds in a slot: every time zone in use today is offset from UTC by a whole number of quarter hours. */
export const SLOT_SECONDS = 900;

/** Reads the totals a floor report is made of. */
export class ReportsRepository {
  constructor(private readonly db: Db) {}

  /** The shop's time zone. */
  async timeZone(): Promise<string> {
    const row = await this.db('shop_settings').where({ id: 1 }).first('time_zone');
    if (!row) throw new Error('The shop settings row is missing: run the migrations and seeds.');
    return row.time_zone;
  }

  /** Every station, by kind in floor order, then name. */
  stations(): Promise<Pick<StationRow, 'id' | 'name' | 'kind'>[]> {
    return this.db('stations').orderByRaw("FIELD(kind, 'cut', 'weed', 'press', 'pack')").orderBy('name').select('id', 'name', 'kind');
  }

  /**
   * Pieces per station, kind and 15-minute slot from `from` (included) to `to` (excluded). The database sums
   * (a year of events stays a few thousand rows) and the service puts each slot on its local day: a slot never
   * straddles local midnight, and the time zone rules stay in one place instead of MariaDB's optional zone tables.
   */
  async slotTotals(from: Date, to: Date): Promise<SlotTotalRow[]> {
    const rows = (await this.db('events')
      .whereIn('kind', REPORTED_KINDS)
      .where('server_at', '>=', from)
      .andWhere('server_at', '<', to)
      .whereNotNull('station_id')
      .groupBy('station_id', 'kind', 'slot')
      .select('station_id', 'kind', this.db.raw(`FLOOR(UNIX_TIMESTAMP(server_at) / ${SLOT_SECONDS}) AS slot`))
      .sum({ pieces: 'quantity' })) as { station_id: number; kind: EventKind; slot: string | number; pieces: string | number }[];
    return rows.map((row) => ({ station_id: row.station_id, kind: row.kind, slot: Number(row.slot), pieces: Number(row.pieces) }));
  }

  /** Pieces spoiled per reason and stage from `from` (included) to `to` (excluded), by the spoil event's arrival. */
  async reasonTotals(from: Date, to: Date): Promise<ReasonTotalRow[]> {
    const rows = (await this.db('spoils')
      .join('events', 'events.id', 'spoils.event_id')
      .join('spoil_reasons', 'spoil_reasons.id', 'spoils.reason_id')
      .where('events.server_at', '>=', from)
      .andWhere('events.server_at', '<', to)
      .groupBy('spoil_reasons.label', 'spoils.stage')
      .select('spoil_reasons.label as reason', 'spoils.stage')
      .sum({ pieces: 'spoils.quantity' })) as { reason: string; stage: StationKind; pieces: string | number }[];
    return rows.map((row) => ({ ...row, pieces: Number(row.pieces) }));
  }
}
