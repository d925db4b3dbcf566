import type { BagStage } from '../../src/shared/names';
import { likePattern } from '../customers/customers-repository';
import type { CustomerRow, Db, OrderRow } from '../db/tables';

/** How the Orders list may be sorted. */
export type OrderSort = 'dueAt' | 'code' | 'customer' | 'pieces';

/** A filtered, sorted page of the Orders list. */
export interface OrderPageQuery {
  q: string;
  status?: OrderRow['status'];
  sort: OrderSort;
  dir: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

/** An order row with its customer's name and counts, for the list. */
export interface OrderListRecord extends OrderRow {
  customer_name: string;
  pieces: number;
  bag_count: number;
}

// Sum of every value in each job's {"S": 4, "M": 10} quantities, through MariaDB's JSON_TABLE (10.6+).
const PIECES_SQL = `(SELECT COALESCE(SUM(q.n), 0) FROM jobs j,
  JSON_TABLE(JSON_EXTRACT(j.quantities, '$.*'), '$[*]' COLUMNS (n INT PATH '$')) AS q
  WHERE j.order_id = orders.id)`;

// Codes are numbers kept as text: sort by length first so 999 comes before 1000.
const SORT_SQL: Record<OrderSort, string> = {
  dueAt: 'orders.due_at',
  code: 'CHAR_LENGTH(orders.code) {dir}, orders.code',
  customer: 'customers.name',
  pieces: 'pieces',
};

/** Database access for orders and the Orders list. */
export class OrdersRepository {
  constructor(private readonly db: Db) {}

  /** One order by id. */
  find(id: number): Promise<OrderRow | undefined> {
    return this.db('orders').where({ id }).first();
  }

  /** A customer's name only: what floor screens may show. */
  async customerName(customerId: number): Promise<string> {
    return (await this.db('customers').where({ id: customerId }).first('name'))?.name ?? '';
  }

  /** One page of orders and the total that match the search and status. */
  async page(query: OrderPageQuery): Promise<{ items: OrderListRecord[]; total: number }> {
    const base = this.db('orders').join('customers', 'customers.id', 'orders.customer_id');
    if (query.q) {
      base.where((w) => w.where('orders.code', 'like', likePattern(query.q)).orWhere('customers.name', 'like', likePattern(query.q)));
    }
    if (query.status) base.where('orders.status', query.status);
    const [counted] = await base.clone().count({ n: '*' });
    const dir = query.dir === 'desc' ? 'DESC' : 'ASC';
    const items = (await base
      .clone()
      .select('orders.*', 'customers.name as customer_name', this.db.raw(`${PIECES_SQL} AS pieces`), this.db.raw('(SELECT COUNT(*) FROM bags b WHERE b.order_id = orders.id) AS bag_count'))
      .orderByRaw(`${SORT_SQL[query.sort].replace('{dir}', dir)} ${dir}, orders.id ${dir}`)
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize)) as OrderListRecord[];
    return { items: items.map((item) => ({ ...item, pieces: Number(item.pieces), bag_count: Number(item.bag_count) })), total: Number(counted?.['n'] ?? 0) };
  }

  /** Pieces per bag stage for each of the given orders. */
  async piecesByStage(orderIds: number[]): Promise<{ order_id: number; stage: BagStage; pieces: number }[]> {
    if (orderIds.length === 0) return [];
    const rows = await this.db('bags').whereIn('order_id', orderIds).groupBy('order_id', 'stage').select('order_id', 'stage').sum({ pieces: 'pieces' });
    return rows.map((row) => ({ order_id: row.order_id as number, stage: row.stage as BagStage, pieces: Number(row['pieces']) }));
  }

  /** The highest order code that is a plain number, or null if there is none. */
  async highestNumericCode(): Promise<number | null> {
    const row = await this.db('orders').whereRaw("code REGEXP '^[0-9]+$'").orderByRaw('CAST(code AS UNSIGNED) DESC').first('code');
    return row ? Number(row.code) : null;
  }

  /** Stores a new order, with its new customer if it has one, in one transaction; answers the order's id. */
  insert(
    order: Pick<OrderRow, 'code' | 'due_at' | 'notes' | 'created_by'> & { customer_id?: number },
    newCustomer?: Pick<CustomerRow, 'name' | 'contact_name' | 'email' | 'phone'>,
  ): Promise<number> {
    return this.db.transaction(async (trx) => {
      const customerId = newCustomer ? (await trx('customers').insert({ ...newCustomer, notes: '' }))[0]! : order.customer_id!;
      const [id] = await trx('orders').insert({ ...order, customer_id: customerId });
      return id!;
    });
  }

  /** Changes an order's customer, due date, notes or status. */
  async update(id: number, changes: Partial<Pick<OrderRow, 'customer_id' | 'due_at' | 'notes' | 'status'>>): Promise<void> {
    await this.db('orders').where({ id }).update({ ...changes, updated_at: new Date() });
  }
}
