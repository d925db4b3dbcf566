import type { Logger } from 'pino';
import { MAIL_MAX_ATTEMPTS, type MailSummary } from '../../src/shared/mail-contract';
import type { Db, MailLogRow } from '../db/tables';
import { conflict, notFound } from '../http/http-error';
import { failureSentence } from './mail-failure';
import { toMailSummary } from './mail-log-view';
import { MailRepository } from './mail-repository';
import { createMailTransport, type MailTransport } from './mail-transport';
import type { OutgoingMail } from './messages/mail-content';
import { SmtpSink } from './smtp-sink';

/** Waits after the 1st, 2nd, 3rd and later failed tries: a mail service that is down usually comes back within the hour. */
export const RETRY_DELAYS_MS = [30_000, 2 * 60_000, 10 * 60_000, 30 * 60_000] as const;
/** How long one claimed send may take before another sender may try the row again (longer than the transport's timeouts). */
export const SEND_LEASE_MS = 2 * 60_000;
/** How often the outbox looks for due retries. */
export const POLL_MS = 15_000;
const BATCH = 50;

/** How the outbox reaches a mail service. */
export interface MailOutboxOptions {
  /** The shop's mail service; without it the outbox starts an in-process sink. */
  smtpUrl?: string;
  /** The From header; by default the shop's name and e-mail from the shop settings. */
  mailFrom?: string;
  logger: Logger;
}

/** When to try a message again after `attempts` tries have failed; null when it now waits for a lead. */
export function nextAttemptAt(attempts: number, failedAt: Date): Date | null {
  if (attempts >= MAIL_MAX_ATTEMPTS) return null;
  const delay = RETRY_DELAYS_MS[Math.min(Math.max(attempts, 1), RETRY_DELAYS_MS.length) - 1]!;
  return new Date(failedAt.getTime() + delay);
}

/**
 * The hub's outbox: callers store a message with `enqueue` inside the transaction of the change that
 * causes it (so a crash never loses it), then `kick()` after the commit. Queued and due failed messages
 * are sent one at a time; a failure is kept with a sentence and retried later with a growing delay.
 */
export class MailOutbox {
  private readonly repository: MailRepository;
  private transport: MailTransport | null = null;
  private ownSink: SmtpSink | null = null;
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<void> | null = null;
  private again = false;
  private readonly sending = new Set<number>();

  constructor(
    db: Db,
    private readonly options: MailOutboxOptions,
  ) {
    this.repository = new MailRepository(db);
  }

  /** The in-process sink when no SMTP_URL is set (after start), for development and tests. */
  get sink(): SmtpSink | null {
    return this.ownSink;
  }

  /** Connects to the mail service (starting the sink when there is none), sends what was left queued, and starts the retry timer. */
  async start(): Promise<void> {
    if (this.transport) return;
    let url = this.options.smtpUrl;
    if (!url) {
      this.ownSink = new SmtpSink();
      await this.ownSink.start();
      url = this.ownSink.url;
      this.options.logger.info({ port: this.ownSink.port }, 'No SMTP_URL: mail goes to the in-process sink; read it in the Mail outbox.');
    }
    this.transport = createMailTransport(url, { sink: Boolean(this.ownSink) });
    this.timer = setInterval(() => this.kick(), POLL_MS);
    this.timer.unref();
    this.kick();
  }

  /** Stores a message as queued on `db`, which should be the transaction of the change that causes it. */
  enqueue(db: Db, mail: OutgoingMail): Promise<number> {
    return new MailRepository(db).insert(mail, new Date());
  }

  /** Sends whatever is due, in the background; call it after the enqueueing transaction commits. */
  kick(): void {
    if (!this.transport) return;
    void this.sendDue().catch((error: unknown) => this.options.logger.error({ err: error }, 'The mail outbox could not read its queue.'));
  }

  /**
   * Sends every message due at `now` (a later `now` lets tests stand in for waiting). Runs one pass at a
   * time: a kick during a pass asks for one more pass afterwards.
   */
  async sendDue(now?: Date): Promise<void> {
    if (!this.transport) return;
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = (async () => {
      do {
        this.again = false;
        const at = now ?? new Date();
        for (const id of await this.repository.dueIds(at, BATCH)) await this.sendOne(id, at);
      } while (this.again);
    })().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  /** A lead's retry: makes a failed (or still queued) message due now and sends it; answers it as it ends up. */
  async retry(id: number): Promise<MailSummary> {
    const row = await this.repository.find(id);
    if (!row) throw notFound(`There is no message ${id} in the Mail outbox. Reload the list.`);
    if (row.status === 'sent') throw conflict(`Message ${id} was already sent${row.sent_at ? ` at ${new Date(row.sent_at).toISOString()}` : ''}: there is nothing to retry.`);
    if (this.sending.has(id)) throw conflict(`Message ${id} is being sent right now. Reload the list in a moment.`);
    const now = new Date();
    await this.repository.dueNow(id, now);
    await this.sendDue(now);
    return toMailSummary((await this.repository.find(id))!);
  }

  /** Stops the timer, waits for a pass in progress, and closes the transport and the sink. */
  async close(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    await this.running?.catch(() => undefined);
    this.transport?.close();
    this.transport = null;
    await this.ownSink?.close();
  }

  private async sendOne(id: number, now: Date): Promise<void> {
    if (this.sending.has(id)) return;
    this.sending.add(id);
    try {
      const row = await this.repository.claim(id, now, new Date(now.getTime() + SEND_LEASE_MS));
      if (!row) return;
      await this.deliver(row);
    } finally {
      this.sending.delete(id);
    }
  }

  private async deliver(row: MailLogRow): Promise<void> {
    try {
      const info = await this.transport!.sendMail({
        from: await this.from(),
        to: row.to,
        subject: row.subject,
        text: row.text,
        html: row.html,
        // RFC 3834: an automatic message, so mail programs do not send holiday replies back to it.
        headers: { 'Auto-Submitted': 'auto-generated' },
      });
      await this.repository.markSent(row.id, info.messageId, new Date());
    } catch (error) {
      const failedAt = new Date();
      const sentence = failureSentence(error);
      await this.repository.markFailed(row.id, sentence, nextAttemptAt(row.attempts, failedAt));
      this.options.logger.warn({ mailId: row.id, attempts: row.attempts }, sentence);
    }
  }

  private async from(): Promise<string | { name: string; address: string }> {
    if (this.options.mailFrom) return this.options.mailFrom;
    const shop = await this.repository.shop();
    return { name: shop.shop_name, address: shop.email };
  }
}
