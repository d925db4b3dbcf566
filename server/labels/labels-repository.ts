import type { Db } from '../db/tables';

/** Database access for what labels need beyond the order: the shop's time zone. */
export class LabelsRepository {
  constructor(private readonly db: Db) {}

  /** The shop's IANA time zone, for due dates printed on labels. */
  async shopTimeZone(): Promise<string> {
    return (await this.db('shop_settings').first('time_zone'))?.time_zone ?? 'UTC';
  }

  /** The order a bag belongs to, or null for an unknown bag. */
  async orderIdOfBag(bagId: number): Promise<number | null> {
    return (await this.db('bags').where({ id: bagId }).first('order_id'))?.order_id ?? null;
  }
}
