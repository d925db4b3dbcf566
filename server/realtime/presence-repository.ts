import type { Db } from '../db/tables';

/** Records when a station tablet was last heard from. */
export class PresenceRepository {
  constructor(private readonly db: Db) {}

  /** Sets the station's last-seen time. */
  async markSeen(stationId: number, at: Date): Promise<void> {
    await this.db('stations').where({ id: stationId }).update({ last_seen_at: at });
  }
}
