import type { Db, DisplayRow } from '../db/tables';

/** Database access for wall displays. */
export class DisplaysRepository {
  constructor(private readonly db: Db) {}

  /** Displays that still hold a valid token. */
  listActive(): Promise<DisplayRow[]> {
    return this.db('displays').whereNull('revoked_at').orderBy('name');
  }

  /** Adds a display; returns its id. */
  async create(name: string, tokenHash: string, createdBy: number | null): Promise<number> {
    const [id] = await this.db('displays').insert({ name, token_hash: tokenHash, created_by: createdBy });
    return id!;
  }

  /** Revokes an active display; false when there was none. */
  async revoke(id: number): Promise<boolean> {
    const changed = await this.db('displays').where({ id }).whereNull('revoked_at').update({ revoked_at: new Date() });
    return changed > 0;
  }
}
