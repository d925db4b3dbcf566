import type { BagRow, Db, OrderRow, StationRow } from '../db/tables';

/** A bag with its order's status and the version a station compares with its last pull. */
export type VersionedBag = BagRow & { order_status: OrderRow['status']; effective_version: number | string };

/** The order facts a ticket shows (no customer contact data). */
export interface TicketOrder {
  id: number;
  code: string;
  due_at: Date;
  customer_name: string;
}

const MICROS = (column: string) => `CAST(UNIX_TIMESTAMP(${column}) * 1000000 AS UNSIGNED)`;
// Cancelling an order touches only the order, so its time counts as a change of each of its bags.
const EFFECTIVE_VERSION = `GREATEST(bags.version, ${MICROS('orders.updated_at')})`;

/** Database reads for station tickets. */
export class TicketsRepository {
  constructor(private readonly db: Db) {}

  /** A station by id. */
  station(id: number): Promise<StationRow | undefined> {
    return this.db('stations').where({ id }).first();
  }

  /** The hub's current version: microseconds since the epoch on the database clock. */
  async currentVersion(): Promise<number> {
    const [rows] = (await this.db.raw(`SELECT ${MICROS('NOW(6)')} AS v`)) as [{ v: number | string }[]];
    return Number(rows[0]!.v);
  }

  /** Bags changed after `after` (all bags when null), oldest change first; `openOnly` leaves out packed bags and cancelled orders. */
  changedBags(after: number | null, openOnly: boolean): Promise<VersionedBag[]> {
    const query = this.db('bags')
      .join('orders', 'orders.id', 'bags.order_id')
      .select('bags.*', 'orders.status as order_status', this.db.raw(`${EFFECTIVE_VERSION} AS effective_version`))
      .orderByRaw(`${EFFECTIVE_VERSION}, bags.id`);
    if (after !== null) query.whereRaw(`${EFFECTIVE_VERSION} > ?`, [after]);
    if (openOnly) query.whereNot('orders.status', 'cancelled').whereNot('bags.stage', 'packed');
    return query as unknown as Promise<VersionedBag[]>;
  }

  /** One bag with its order's status and version. */
  bag(id: number): Promise<VersionedBag | undefined> {
    return this.db('bags')
      .join('orders', 'orders.id', 'bags.order_id')
      .where('bags.id', id)
      .first('bags.*', 'orders.status as order_status', this.db.raw(`${EFFECTIVE_VERSION} AS effective_version`)) as unknown as Promise<VersionedBag | undefined>;
  }

  /** The orders with these ids, with their customers' names. */
  orders(ids: number[]): Promise<TicketOrder[]> {
    if (ids.length === 0) return Promise.resolve([]);
    return this.db('orders')
      .join('customers', 'customers.id', 'orders.customer_id')
      .whereIn('orders.id', ids)
      .select('orders.id', 'orders.code', 'orders.due_at', 'customers.name as customer_name');
  }
}
