import type { Db, ShopSettingsRow } from '../db/tables';

/** The columns the owner changes; the row's id and updated_at are the repository's to set. */
export type ShopSettingsChanges = Omit<ShopSettingsRow, 'id' | 'updated_at'>;

/** Database access for the shop's one settings row. */
export class ShopRepository {
  constructor(private readonly db: Db) {}

  /** The shop's settings; a missing row means the database was never seeded. */
  async find(): Promise<ShopSettingsRow> {
    const row = await this.db('shop_settings').where({ id: 1 }).first();
    if (!row) throw new Error('The shop settings row is missing: run the migrations and seeds.');
    return row;
  }

  /** Replaces the settings and stamps the time of the change. */
  async update(changes: ShopSettingsChanges, at: Date): Promise<void> {
    await this.db('shop_settings').where({ id: 1 }).update({ ...changes, updated_at: at });
  }
}
