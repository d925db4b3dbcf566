import type { Knex } from 'knex';
import type { EventKind, StationKind } from '../../src/shared/names';
import type { BagRow, Db, ShopSettingsRow, StationRow } from '../db/tables';
import { rollsWithFilm } from '../rolls/rolls-repository';
import type { RollWithFilm } from '../rolls/roll-view';

/** A stored event of the shift with its station's kind and, for a spoil, the stage and reason label. */
export interface ShiftEventRow {
  bag_id: number;
  station_id: number;
  station_kind: StationKind;
  kind: EventKind;
  quantity: number;
  server_at: Date;
  client_at: Date;
  spoil_stage: StationKind | null;
  reason: string | null;
}

/** A bag on the board, with its order's status. */
export type BoardBagRow = Pick<BagRow, 'id' | 'order_id' | 'code' | 'stage' | 'pieces' | 'qty_cut' | 'qty_weeded' | 'qty_pressed' | 'qty_packed' | 'created_at'>;

/** An open order with its customer's name. */
export interface OpenOrderRow {
  id: number;
  code: string;
  due_at: Date;
  customer_name: string;
}

/** The latest over-count reason of a flagged bag of an open order. */
export interface FlagRow {
  bag_id: number;
  bag_code: string;
  order_code: string;
  over_count_reason: string | null;
  server_at: Date | null;
}

/** The event kinds the floor numbers read: done work and spoils move them; a scan marks when work on a bag began. */
export const BOARD_EVENT_KINDS: readonly EventKind[] = ['scan', 'cut_done', 'weed_done', 'press_done', 'pack_done', 'spoil'];

/** Reads what the floor board is made of, in a handful of queries. */
export class BoardRepository {
  constructor(private readonly db: Db) {}

  /** The shop's settings (one row). */
  async settings(): Promise<ShopSettingsRow> {
    const row = await this.db('shop_settings').where({ id: 1 }).first();
    if (!row) throw new Error('The shop settings row is missing: run the migrations and seeds.');
    return row;
  }

  /** Every station, by kind in floor order, then name. */
  stations(): Promise<StationRow[]> {
    return this.db('stations').orderByRaw("FIELD(kind, 'cut', 'weed', 'press', 'pack')").orderBy('name');
  }

  /** Each station's latest event ever (an idle station still shows when it last reported). */
  async lastEventAt(): Promise<Map<number, Date>> {
    const rows = (await this.db('events').whereNotNull('station_id').groupBy('station_id').select('station_id').max({ at: 'server_at' })) as { station_id: number; at: Date }[];
    return new Map(rows.map((row) => [row.station_id, row.at]));
  }

  /** Events stored from `from` to `to` (both included) with station kind, spoil stage and reason, in the order stored. */
  async eventsBetween(from: Date, to: Date): Promise<ShiftEventRow[]> {
    return (await this.db('events')
      .join('stations', 'stations.id', 'events.station_id')
      .leftJoin('spoils', 'spoils.event_id', 'events.id')
      .leftJoin('spoil_reasons', 'spoil_reasons.id', 'spoils.reason_id')
      // Test cuts tell the board nothing; naming the kinds also lets MariaDB range-read the (kind, server_at) index.
      .whereIn('events.kind', BOARD_EVENT_KINDS)
      .whereBetween('events.server_at', [from, to])
      .whereNotNull('events.bag_id')
      .orderBy('events.seq')
      .select(
        'events.bag_id',
        'events.station_id',
        'stations.kind as station_kind',
        'events.kind',
        'events.quantity',
        'events.server_at',
        'events.client_at',
        'spoils.stage as spoil_stage',
        'spoil_reasons.label as reason',
      )) as ShiftEventRow[];
  }

  /** Bags of open orders, and bags packed from `from` to `to` whatever their order's status now. */
  async boardBags(from: Date, to: Date): Promise<BoardBagRow[]> {
    return (await this.db('bags')
      .join('orders', 'orders.id', 'bags.order_id')
      .where('orders.status', 'open')
      .orWhereIn('bags.id', (sub: Knex.QueryBuilder) => sub.from('events').where('kind', 'pack_done').whereBetween('server_at', [from, to]).select('bag_id'))
      .select('bags.id', 'bags.order_id', 'bags.code', 'bags.stage', 'bags.pieces', 'bags.qty_cut', 'bags.qty_weeded', 'bags.qty_pressed', 'bags.qty_packed', 'bags.created_at')) as BoardBagRow[];
  }

  /** Open orders, soonest due first, with the customer's name. */
  async openOrders(): Promise<OpenOrderRow[]> {
    return (await this.db('orders')
      .join('customers', 'customers.id', 'orders.customer_id')
      .where('orders.status', 'open')
      .orderBy([{ column: 'orders.due_at' }, { column: 'orders.id' }])
      .select('orders.id', 'orders.code', 'orders.due_at', 'customers.name as customer_name')) as OpenOrderRow[];
  }

  /** Rolls still on the rack with less left than their reorder length, least left first. */
  async lowRolls(): Promise<RollWithFilm[]> {
    return (await rollsWithFilm(this.db)
      .whereNull('rolls.emptied_at')
      .whereRaw('rolls.remaining_mm < rolls.reorder_mm')
      .orderBy([{ column: 'rolls.remaining_mm' }, { column: 'rolls.label' }])) as RollWithFilm[];
  }

  /** Over-count bags of open orders with the reason of each bag's latest flagged event. */
  async overCountFlags(): Promise<FlagRow[]> {
    const flaggedBags = (sub: Knex.QueryBuilder) =>
      sub.from('bags').join('orders', 'orders.id', 'bags.order_id').where('orders.status', 'open').andWhere('bags.over_count', true).select('bags.id');
    const latestFlagged = this.db('events')
      .whereIn('bag_id', flaggedBags)
      .whereNotNull('over_count_reason')
      .groupBy('bag_id')
      .select('bag_id')
      .max({ seq: 'seq' })
      .as('latest');
    return (await this.db('bags')
      .join('orders', 'orders.id', 'bags.order_id')
      .leftJoin(latestFlagged, 'latest.bag_id', 'bags.id')
      .leftJoin('events', 'events.seq', 'latest.seq')
      .where('orders.status', 'open')
      .andWhere('bags.over_count', true)
      .orderBy([{ column: 'events.server_at', order: 'desc' }, { column: 'bags.id' }])
      .select('bags.id as bag_id', 'bags.code as bag_code', 'orders.code as order_code', 'events.over_count_reason', 'events.server_at')) as FlagRow[];
  }
}
