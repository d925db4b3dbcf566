import type { Db, DisplayRow, StationRow, UserRow } from '../db/tables';

/** Database reads for signing in. */
export class AuthRepository {
  constructor(private readonly db: Db) {}

  /** An active owner or lead by e-mail (case-insensitive). */
  findPersonByEmail(email: string): Promise<UserRow | undefined> {
    return this.db('users')
      .whereRaw('LOWER(email) = ?', [email.toLowerCase()])
      .where({ active: true })
      .whereIn('role', ['owner', 'lead'])
      .first();
  }

  /** The station a device token hash belongs to. */
  findStationByTokenHash(tokenHash: string): Promise<StationRow | undefined> {
    return this.db('stations').where({ device_token_hash: tokenHash }).first();
  }

  /** A display that has not been revoked, by its token hash. */
  findDisplayByTokenHash(tokenHash: string): Promise<DisplayRow | undefined> {
    return this.db('displays').where({ token_hash: tokenHash }).whereNull('revoked_at').first();
  }

  /** Active operators who have a PIN, by name. */
  listOperators(): Promise<Pick<UserRow, 'id' | 'name' | 'pin_hash'>[]> {
    return this.db('users')
      .select('id', 'name', 'pin_hash')
      .where({ role: 'operator', active: true })
      .whereNotNull('pin_hash')
      .orderBy('name');
  }

  /** Marks the station as seen now. */
  async touchStation(stationId: number): Promise<void> {
    await this.db('stations').where({ id: stationId }).update({ last_seen_at: new Date() });
  }
}
