import type { OrderCreate, OrderDetail, OrderListItem, OrderPage, OrderUpdate } from '../../src/shared/intake-contract';
import { BAG_STAGES, type BagStage } from '../../src/shared/names';
import { toBagSummary } from '../bags/bag-view';
import { BagsRepository } from '../bags/bags-repository';
import { toCustomer } from '../customers/customer-view';
import { CustomersRepository } from '../customers/customers-repository';
import type { Db } from '../db/tables';
import { badRequest, conflict, notFound } from '../http/http-error';
import { toJobDetail } from '../jobs/job-view';
import { JobsRepository } from '../jobs/jobs-repository';
import { OrdersRepository, type OrderPageQuery } from './orders-repository';

/** The first order code in a shop with no numbered orders yet. */
export const FIRST_ORDER_CODE = 1001;
const CODE_ATTEMPTS = 5;

const isDuplicateKey = (err: unknown) => (err as { code?: string }).code === 'ER_DUP_ENTRY';

/** Orders: the list, creating and changing an order, cancelling it, and its full detail. */
export class OrdersService {
  private readonly orders: OrdersRepository;
  private readonly customers: CustomersRepository;
  private readonly jobs: JobsRepository;
  private readonly bags: BagsRepository;

  constructor(db: Db) {
    this.orders = new OrdersRepository(db);
    this.customers = new CustomersRepository(db);
    this.jobs = new JobsRepository(db);
    this.bags = new BagsRepository(db);
  }

  /** One page of the Orders list. */
  async list(query: OrderPageQuery): Promise<OrderPage> {
    const { items, total } = await this.orders.page(query);
    const stages = await this.orders.piecesByStage(items.map((item) => item.id));
    const listItems = items.map((item): OrderListItem => {
      const piecesByStage = Object.fromEntries(BAG_STAGES.map((stage) => [stage, 0])) as Record<BagStage, number>;
      for (const row of stages.filter((s) => s.order_id === item.id)) piecesByStage[row.stage] = row.pieces;
      // Pieces not yet in a bag wait in the queue too.
      const bagged = BAG_STAGES.reduce((sum, stage) => sum + piecesByStage[stage], 0);
      piecesByStage.queued += Math.max(0, item.pieces - bagged);
      return {
        id: item.id,
        code: item.code,
        customer: { id: item.customer_id, name: item.customer_name },
        dueAt: item.due_at.toISOString(),
        status: item.status,
        pieces: item.pieces,
        bagCount: item.bag_count,
        piecesByStage,
        createdAt: item.created_at.toISOString(),
      };
    });
    return { items: listItems, total, page: query.page, pageSize: query.pageSize };
  }

  /** Everything about one order, or a 404 with a sentence. */
  async detail(id: number): Promise<OrderDetail> {
    const order = await this.orders.find(id);
    if (!order) throw notFound(`There is no order ${id}. Go back to Orders and pick one from the list.`);
    const [customer, jobs, bags] = await Promise.all([this.customers.find(order.customer_id), this.jobs.records({ orderId: id }), this.bags.forOrder(id)]);
    const spoiledAt = await this.bags.spoiledAtByBag(bags.map((bag) => bag.id));
    return {
      id: order.id,
      code: order.code,
      customer: toCustomer(customer!),
      dueAt: order.due_at.toISOString(),
      status: order.status,
      notes: order.notes,
      jobs: jobs.map(toJobDetail),
      bags: bags.map((bag) => toBagSummary(bag, spoiledAt)),
    };
  }

  /** Creates an order with the next free number as its code; answers its detail. */
  async create(input: OrderCreate, createdBy: number | null): Promise<OrderDetail> {
    if (input.customerId !== undefined) await this.customerOr400(input.customerId);
    const newCustomer = input.newCustomer
      ? { name: input.newCustomer.name, contact_name: input.newCustomer.contactName, email: input.newCustomer.email, phone: input.newCustomer.phone }
      : undefined;
    // Two leads saving at once can pick the same number; the unique code makes one retry with the next.
    for (let attempt = 1; ; attempt++) {
      const code = String(((await this.orders.highestNumericCode()) ?? FIRST_ORDER_CODE - 1) + 1);
      try {
        const id = await this.orders.insert(
          { code, customer_id: input.customerId, due_at: new Date(input.dueAt), notes: input.notes ?? '', created_by: createdBy },
          newCustomer,
        );
        return this.detail(id);
      } catch (err) {
        if (!isDuplicateKey(err) || attempt >= CODE_ATTEMPTS) throw err;
      }
    }
  }

  /** Changes an order's customer, due date or notes. */
  async update(id: number, changes: OrderUpdate): Promise<OrderDetail> {
    const order = await this.orders.find(id);
    if (!order) throw notFound(`There is no order ${id}. Go back to Orders and pick one from the list.`);
    if (order.status === 'cancelled') throw conflict(`Order ${order.code} is cancelled and can no longer be changed.`);
    if (changes.customerId !== undefined) await this.customerOr400(changes.customerId);
    await this.orders.update(id, {
      ...(changes.customerId !== undefined && { customer_id: changes.customerId }),
      ...(changes.dueAt !== undefined && { due_at: new Date(changes.dueAt) }),
      ...(changes.notes !== undefined && { notes: changes.notes }),
    });
    return this.detail(id);
  }

  /** Cancels an order unless a bag of it is already packed. */
  async cancel(id: number): Promise<OrderDetail> {
    const order = await this.orders.find(id);
    if (!order) throw notFound(`There is no order ${id}. Go back to Orders and pick one from the list.`);
    if ((await this.bags.countPastQueued({ orderId: id, stage: 'packed' })) > 0) {
      throw conflict(`Order ${order.code} has packed bags and cannot be cancelled. Talk to the customer about the finished pieces first.`);
    }
    if (order.status !== 'cancelled') await this.orders.update(id, { status: 'cancelled' });
    return this.detail(id);
  }

  private async customerOr400(id: number): Promise<void> {
    if (!(await this.customers.find(id))) throw badRequest(`There is no customer ${id}. Search for the customer again or enter a new one.`, [{ path: 'customerId', message: 'No such customer.' }]);
  }
}
