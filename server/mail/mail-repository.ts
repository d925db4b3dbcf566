import type { MailKind, MailStatus } from '../../src/shared/mail-contract';
import type { Db, MailLogRow, ShopSettingsRow, UserRow } from '../db/tables';
import type { OutgoingMail, ShopIdentity } from './messages/mail-content';

/** Filters and page of the Mail outbox list. */
export interface MailFilter {
  status?: MailStatus;
  kind?: MailKind;
  page: number;
  pageSize: number;
}

const json = (db: Db, value: unknown) => db.raw('?', [JSON.stringify(value)]) as never;

/** Database access for the mail log (the outbox) and the addresses messages go to. */
export class MailRepository {
  constructor(private readonly db: Db) {}

  /** Stores a message as queued, due at once; answers its id. */
  async insert(mail: OutgoingMail, now: Date): Promise<number> {
    const [id] = await this.db('mail_log').insert({
      kind: mail.kind,
      to: mail.to,
      subject: mail.subject.slice(0, 200),
      text: mail.text,
      html: mail.html,
      related: json(this.db, mail.related),
      status: 'queued',
      next_attempt_at: now,
    });
    return id!;
  }

  /** Ids of queued or failed messages whose next try is due, oldest first. */
  async dueIds(now: Date, limit: number): Promise<number[]> {
    const rows = await this.db('mail_log').whereIn('status', ['queued', 'failed']).where('next_attempt_at', '<=', now).orderBy('id').limit(limit).select('id');
    return rows.map((row) => row.id);
  }

  /**
   * Claims a due message for one send: counts the attempt and pushes its next try past the lease, in
   * one conditional UPDATE, so a second sender (another loop or hub process) finds nothing to claim.
   */
  async claim(id: number, now: Date, leaseUntil: Date): Promise<MailLogRow | null> {
    const claimed = await this.db('mail_log')
      .where({ id })
      .whereIn('status', ['queued', 'failed'])
      .where('next_attempt_at', '<=', now)
      .update({ attempts: this.db.raw('LEAST(attempts + 1, 255)') as never, next_attempt_at: leaseUntil });
    return claimed === 1 ? ((await this.find(id)) ?? null) : null;
  }

  /** Records a delivered message. */
  async markSent(id: number, messageId: string, at: Date): Promise<void> {
    await this.db('mail_log').where({ id }).update({ status: 'sent', sent_at: at, message_id: messageId.slice(0, 250), last_error: null, next_attempt_at: null });
  }

  /** Records a failed try and when to try again (null: wait for a lead). */
  async markFailed(id: number, sentence: string, nextAttemptAt: Date | null): Promise<void> {
    await this.db('mail_log').where({ id }).update({ status: 'failed', last_error: sentence.slice(0, 500), next_attempt_at: nextAttemptAt });
  }

  /** Makes a queued or failed message due now; false when it is sent or does not exist. */
  async dueNow(id: number, now: Date): Promise<boolean> {
    return (await this.db('mail_log').where({ id }).whereIn('status', ['queued', 'failed']).update({ next_attempt_at: now })) === 1;
  }

  /** One message. */
  find(id: number): Promise<MailLogRow | undefined> {
    return this.db('mail_log').where({ id }).first();
  }

  /** One page of messages, newest first, and how many match in all. */
  async page(filter: MailFilter): Promise<{ rows: MailLogRow[]; total: number }> {
    const match: Partial<Pick<MailLogRow, 'status' | 'kind'>> = {};
    if (filter.status) match.status = filter.status;
    if (filter.kind) match.kind = filter.kind;
    const [{ n }] = (await this.db('mail_log').where(match).count({ n: '*' })) as [{ n: number | string }];
    const rows = (await this.db('mail_log')
      .where(match)
      .orderBy([{ column: 'created_at', order: 'desc' }, { column: 'id', order: 'desc' }])
      .offset((filter.page - 1) * filter.pageSize)
      .limit(filter.pageSize)
      .select('*')) as MailLogRow[];
    return { rows, total: Number(n) };
  }

  /** Whether a message of this kind about this shift date already exists (any status). */
  async hasShiftSummary(shiftDate: string): Promise<boolean> {
    const row = await this.db('mail_log')
      .where({ kind: 'shift_summary' })
      .whereRaw("JSON_UNQUOTE(JSON_EXTRACT(related, '$.shiftDate')) = ?", [shiftDate])
      .whereRaw("JSON_EXTRACT(related, '$.final') = true")
      .first('id');
    return Boolean(row);
  }

  /** The shop's name, address and settings; `lock` holds the row until the transaction ends. */
  async shop(options: { lock?: boolean } = {}): Promise<ShopSettingsRow> {
    const query = this.db('shop_settings').where({ id: 1 });
    const row = await (options.lock ? query.forUpdate() : query).first();
    if (!row) throw new Error('The shop settings are missing: run the migrations and seeds.');
    return row;
  }

  /** The shop as its messages name it. */
  async shopIdentity(): Promise<ShopIdentity> {
    const shop = await this.shop();
    return { name: shop.shop_name, address: shop.address, phone: shop.phone, email: shop.email };
  }

  /** E-mail addresses of active people in a role. */
  async activeAddresses(role: UserRow['role']): Promise<string[]> {
    const rows = await this.db('users').where({ role, active: true }).whereNotNull('email').whereNot('email', '').orderBy('id').select('email');
    return rows.map((row) => row.email!);
  }
}
