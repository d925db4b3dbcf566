import type { Db, UserRow } from '../db/tables';

/** Database access for the shop's people. */
export class PeopleRepository {
  constructor(private readonly db: Db) {}

  /** Everyone, active first, by name. */
  list(): Promise<UserRow[]> {
    return this.db('users').orderBy([{ column: 'active', order: 'desc' }, { column: 'name' }]);
  }

  /** One person by id. */
  find(id: number): Promise<UserRow | undefined> {
    return this.db('users').where({ id }).first();
  }

  /** Someone else already using this e-mail (case-insensitive). */
  findByEmail(email: string, exceptId?: number): Promise<UserRow | undefined> {
    const query = this.db('users').whereRaw('LOWER(email) = ?', [email.toLowerCase()]);
    if (exceptId !== undefined) query.whereNot({ id: exceptId });
    return query.first();
  }

  /** PIN hashes of active operators other than the given one. */
  async otherOperatorPinHashes(exceptId?: number): Promise<string[]> {
    const query = this.db('users').where({ role: 'operator', active: true }).whereNotNull('pin_hash');
    if (exceptId !== undefined) query.whereNot({ id: exceptId });
    return (await query.pluck('pin_hash')).filter((hash): hash is string => hash !== null);
  }

  /** How many active owners there are. */
  async activeOwners(): Promise<number> {
    const [row] = await this.db('users').where({ role: 'owner', active: true }).count({ n: '*' });
    return Number(row?.['n'] ?? 0);
  }

  /** Adds a person; returns the new id. */
  async insert(person: Pick<UserRow, 'name' | 'email' | 'role' | 'password_hash' | 'pin_hash'>): Promise<number> {
    const [id] = await this.db('users').insert({ ...person, active: true });
    return id!;
  }

  /** Changes a person's row. */
  async update(id: number, changes: Partial<Pick<UserRow, 'name' | 'email' | 'role' | 'active' | 'password_hash' | 'pin_hash'>>): Promise<void> {
    await this.db('users').where({ id }).update({ ...changes, updated_at: new Date() });
  }

  /** Ends every web session of this person, so a deactivation or new password takes effect at once. */
  async endSessionsOf(userId: number): Promise<void> {
    await this.db('web_sessions').whereRaw("JSON_VALUE(sess, '$.principal.userId') = ?", [userId]).delete();
  }
}
