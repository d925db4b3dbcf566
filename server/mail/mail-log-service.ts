import type { MailDetail, MailPage } from '../../src/shared/mail-contract';
import type { Db, MailLogRow } from '../db/tables';
import { notFound } from '../http/http-error';
import { toMailDetail, toMailSummary } from './mail-log-view';
import { MailRepository, type MailFilter } from './mail-repository';

/** Reading the Mail outbox: pages of messages, one message, its HTML part. */
export class MailLogService {
  private readonly repository: MailRepository;

  constructor(db: Db) {
    this.repository = new MailRepository(db);
  }

  /** One page of messages, newest first. */
  async page(filter: MailFilter): Promise<MailPage> {
    const { rows, total } = await this.repository.page(filter);
    return { items: rows.map(toMailSummary), total, page: filter.page, pageSize: filter.pageSize };
  }

  /** One message with its plain-text part. */
  async detail(id: number): Promise<MailDetail> {
    return toMailDetail(await this.row(id));
  }

  /** The HTML part exactly as sent. */
  async html(id: number): Promise<string> {
    return (await this.row(id)).html;
  }

  private async row(id: number): Promise<MailLogRow> {
    const row = await this.repository.find(id);
    if (!row) throw notFound(`There is no message ${id} in the Mail outbox. Reload the list.`);
    return row;
  }
}
