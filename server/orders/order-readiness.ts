import type { Logger } from 'pino';
import type { Db } from '../db/tables';
import type { MailOutbox } from '../mail/mail-outbox';
import { MailRepository } from '../mail/mail-repository';
import { orderReadyMessage, type ReadyLine } from '../mail/messages/order-ready-message';
import { ReadinessRepository, type ReadyOrderFacts } from './readiness-repository';

const sizesOf = (sizes: unknown): Record<string, number> => (typeof sizes === 'string' ? (JSON.parse(sizes) as Record<string, number>) : ((sizes ?? {}) as Record<string, number>));

/** The packed pieces per job, summed over the order's bags. */
function readyLines(bags: ReadyOrderFacts['bags']): ReadyLine[] {
  const byJob = new Map<number, ReadyLine>();
  for (const bag of bags) {
    const line = byJob.get(bag.job_id) ?? { jobName: bag.name, garment: bag.garment, sizes: {} };
    for (const [size, n] of Object.entries(sizesOf(bag.sizes))) line.sizes[size] = (line.sizes[size] ?? 0) + n;
    byJob.set(bag.job_id, line);
  }
  return [...byJob.values()];
}

/**
 * An order becomes ready when its last bag is packed: in one transaction the order is marked ready
 * (only if still open, so a replayed batch changes nothing) and the customer's message is queued.
 */
export class OrderReadiness {
  private readonly repository: ReadinessRepository;

  constructor(
    db: Db,
    private readonly mail: MailOutbox,
    private readonly logger: Logger,
  ) {
    this.repository = new ReadinessRepository(db);
  }

  /** After a batch of station events commits: makes ready every open order of these bags that is now all packed. Never throws. */
  async bagsChanged(bagIds: number[]): Promise<number[]> {
    if (bagIds.length === 0) return [];
    return this.settle(bagIds);
  }

  /** Makes ready any open order that is all packed, e.g. one whose last batch committed just before a restart. Never throws. */
  sweep(): Promise<number[]> {
    return this.settle();
  }

  private async settle(bagIds?: number[]): Promise<number[]> {
    const ready: number[] = [];
    try {
      for (const orderId of await this.repository.openOrdersAllPacked(bagIds)) {
        if (await this.makeReady(orderId)) ready.push(orderId);
      }
    } catch (error) {
      // The events are stored already; the next batch for the order, or the next start, tries again.
      this.logger.error({ err: error, bagIds }, 'Could not check whether the orders of these bags are ready.');
    }
    if (ready.length > 0) this.mail.kick();
    return ready;
  }

  private makeReady(orderId: number): Promise<boolean> {
    return this.repository.inTransaction(async (repository, trx) => {
      const now = new Date();
      if (!(await repository.markReady(orderId, now))) return false;
      const facts = await repository.facts(orderId);
      const to = (facts.customer.email ?? '').trim();
      if (!to) {
        this.logger.info({ orderId, orderCode: facts.order.code }, `Order ${facts.order.code} is ready; its customer has no e-mail, so no message was sent.`);
        return true;
      }
      const content = orderReadyMessage({
        shop: await new MailRepository(trx).shopIdentity(),
        orderCode: facts.order.code,
        customerName: facts.customer.name,
        contactName: facts.customer.contact_name,
        lines: readyLines(facts.bags),
      });
      await this.mail.enqueue(trx, { kind: 'order_ready', to, related: { orderId, orderCode: facts.order.code }, ...content });
      return true;
    });
  }
}
