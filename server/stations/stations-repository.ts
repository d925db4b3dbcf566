import type { Db, StationRow } from '../db/tables';

/** Database access for stations and their pairing. */
export class StationsRepository {
  constructor(private readonly db: Db) {}

  /** Every station, by kind then name. */
  list(): Promise<StationRow[]> {
    return this.db('stations').orderBy([{ column: 'kind' }, { column: 'name' }]);
  }

  /** One station by id. */
  find(id: number): Promise<StationRow | undefined> {
    return this.db('stations').where({ id }).first();
  }

  /** Stores a new device token hash; any tablet paired before is unpaired by this. */
  async pair(id: number, tokenHash: string, byUserId: number): Promise<void> {
    await this.db('stations').where({ id }).update({ device_token_hash: tokenHash, paired_at: new Date(), paired_by: byUserId });
  }

  /** Forgets the station's tablet. */
  async unpair(id: number): Promise<void> {
    await this.db('stations').where({ id }).update({ device_token_hash: null, paired_at: null, paired_by: null });
  }
}
