import type { BagRow, CustomerRow, Db, JobRow, OrderRow } from '../db/tables';

/** An order made ready, with who to tell and what was packed. */
export interface ReadyOrderFacts {
  order: Pick<OrderRow, 'id' | 'code'>;
  customer: Pick<CustomerRow, 'name' | 'contact_name' | 'email'>;
  bags: (Pick<BagRow, 'job_id' | 'sizes'> & Pick<JobRow, 'name' | 'garment'>)[];
}

// An order whose every bag is packed (and that has at least one bag).
const ALL_BAGS_PACKED =
  'EXISTS (SELECT 1 FROM bags WHERE bags.order_id = orders.id) AND NOT EXISTS (SELECT 1 FROM bags WHERE bags.order_id = orders.id AND bags.stage <> ?)';

/** Database access for an order becoming ready when its last bag is packed. */
export class ReadinessRepository {
  constructor(private readonly db: Db) {}

  /** Runs work in one transaction. */
  inTransaction<T>(work: (repository: ReadinessRepository, trx: Db) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(new ReadinessRepository(trx), trx));
  }

  /** Open orders of these bags whose every bag is packed. */
  async openOrdersAllPacked(bagIds?: number[]): Promise<number[]> {
    const query = this.db('orders').where('orders.status', 'open').whereRaw(ALL_BAGS_PACKED, ['packed']).select('orders.id');
    if (bagIds) query.whereIn('orders.id', this.db('bags').whereIn('id', bagIds).select('order_id'));
    return (await query).map((row) => row.id);
  }

  /** Marks the order ready if it is still open and every bag is packed; false when another batch got there first. */
  async markReady(orderId: number, at: Date): Promise<boolean> {
    const changed = await this.db('orders').where({ id: orderId, status: 'open' }).whereRaw(ALL_BAGS_PACKED, ['packed']).update({ status: 'ready', ready_at: at, updated_at: at });
    return changed === 1;
  }

  /** The order, its customer and its bags with their jobs, for the ready message. */
  async facts(orderId: number): Promise<ReadyOrderFacts> {
    const order = (await this.db('orders').where({ id: orderId }).first('id', 'code', 'customer_id'))!;
    const customer = (await this.db('customers').where({ id: order.customer_id }).first('name', 'contact_name', 'email'))!;
    const bags = (await this.db('bags')
      .join('jobs', 'jobs.id', 'bags.job_id')
      .where('bags.order_id', orderId)
      .orderBy(['jobs.id', 'bags.id'])
      .select('bags.job_id', 'bags.sizes', 'jobs.name', 'jobs.garment')) as ReadyOrderFacts['bags'];
    return { order: { id: order.id, code: order.code }, customer, bags };
  }
}
