import type { BagSummary, BagTicket } from '../../src/shared/intake-contract';
import { bagCode, countPieces, splitIntoBags } from '../../src/shared/intake/bag-split';
import { isBagTokenShape, newBagToken } from '../../src/shared/intake/bag-token';
import type { Db } from '../db/tables';
import { badRequest, conflict, notFound } from '../http/http-error';
import { toJobDetail, toRosterLine } from '../jobs/job-view';
import { JobsRepository } from '../jobs/jobs-repository';
import { OrdersRepository } from '../orders/orders-repository';
import { toBagSummary } from './bag-view';
import { BagsAlreadyStartedError, BagsRepository, type NewBag } from './bags-repository';

/** The index a bag code's letters stand for: "A" is 0, "Z" 25, "AA" 26 (the inverse of bagCode). */
function codeIndex(orderCode: string, code: string): number {
  const letters = code.startsWith(`${orderCode}-`) ? code.slice(orderCode.length + 1) : '';
  if (!/^[A-Z]+$/.test(letters)) return -1;
  return [...letters].reduce((n, letter) => n * 26 + (letter.charCodeAt(0) - 64), 0) - 1;
}

/** Bags: splitting a job into bags and the ticket a station reads by scanning a bag's QR code. */
export class BagsService {
  private readonly bags: BagsRepository;
  private readonly jobs: JobsRepository;
  private readonly orders: OrdersRepository;

  constructor(db: Db) {
    this.bags = new BagsRepository(db);
    this.jobs = new JobsRepository(db);
    this.orders = new OrdersRepository(db);
  }

  /**
   * Splits a job into bags of at most maxPieces (the shop's setting when not given), replacing its
   * queued bags in one transaction; refused once a bag of the job has left the queue.
   */
  async split(jobId: number, maxPieces?: number): Promise<BagSummary[]> {
    const [record] = await this.jobs.records({ jobIds: [jobId] });
    if (!record) throw notFound(`There is no job ${jobId}. Reload the order.`);
    const order = (await this.orders.find(record.job.order_id))!;
    if (order.status !== 'open') throw conflict(`Order ${order.code} is ${order.status}; only an open order's jobs can be split into bags.`);
    const max = maxPieces ?? (await this.bags.defaultMaxPieces());
    const lines = record.rosterLines;
    const plans = record.job.personalised && lines.length > 0 ? splitIntoBags(lines, max) : splitIntoBags(record.job.quantities, max);

    const makeBags = (codesKept: string[]): NewBag[] => {
      const next = codesKept.reduce((highest, code) => Math.max(highest, codeIndex(order.code, code)), -1) + 1;
      return plans.map((plan, i) => ({
        code: bagCode(order.code, next + i),
        token: newBagToken(),
        sizes: plan.sizes as Record<string, number>,
        pieces: countPieces(plan.sizes),
        rosterLineIds: (plan.rosterLineIndexes ?? []).map((index) => lines[index]!.id),
      }));
    };
    try {
      const bags = await this.bags.replaceQueuedBags(order.id, jobId, makeBags);
      const spoiledAt = await this.bags.spoiledAtByBag(bags.map((bag) => bag.id));
      return bags.map((bag) => toBagSummary(bag, spoiledAt));
    } catch (err) {
      if (err instanceof BagsAlreadyStartedError) {
        throw conflict('A bag of this job is already on the floor (cut or later), so the job cannot be split again.');
      }
      throw err;
    }
  }

  /** Everything a station needs about the bag with this token; no customer contact data. */
  async ticket(token: string): Promise<BagTicket> {
    if (!isBagTokenShape(token)) throw badRequest('That is not a bag code from a Dwell label (43 letters, digits, - and _). Scan the label again or type the code.');
    const bag = await this.bags.byToken(token);
    if (!bag) throw notFound('No bag has this code. The label may be from a bag that was split again: ask the lead for a fresh label.');
    const [order, [record], spoiledAt] = await Promise.all([
      this.orders.find(bag.order_id),
      this.jobs.records({ jobIds: [bag.job_id] }),
      this.bags.spoiledAtByBag([bag.id]),
    ]);
    const customerName = await this.orders.customerName(order!.customer_id);
    const { rosterLines, ...job } = toJobDetail(record!);
    return {
      bag: toBagSummary(bag, spoiledAt),
      order: { id: order!.id, code: order!.code, dueAt: order!.due_at.toISOString(), customerName },
      job,
      rosterLines: record!.rosterLines.filter((line) => line.bag_id === bag.id).map(toRosterLine),
    };
  }
}
