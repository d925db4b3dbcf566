import type { Db } from '../db/tables';

/** Records when a station tablet was last heard from. */
export class PresenceRepository {
  constructor(private readonly db: Db) {}

  /** Sets the station's last-seen time unless a later one is stored; answers whether it moved. */
  async markSeen(stationId: number, at: Date): Promise<boolean> {
    // A connect and a ping a moment apart can finish in either order; the time never goes backwards.
    const changed = await this.db('stations')
      .where({ id: stationId })
      .andWhere((q) => q.whereNull('last_seen_at').orWhere('last_seen_at', '<=', at))
      .update({ last_seen_at: at });
    return changed > 0;
  }
}
