import type { Db, SpoilReasonRow } from '../db/tables';

/** Database access for the shop's list of spoil reasons. */
export class SpoilReasonsRepository {
  constructor(private readonly db: Db) {}

  /** Every reason, in list order. */
  list(): Promise<SpoilReasonRow[]> {
    return this.db('spoil_reasons').orderBy([{ column: 'position' }, { column: 'id' }]);
  }

  /** One reason by id. */
  find(id: number): Promise<SpoilReasonRow | undefined> {
    return this.db('spoil_reasons').where({ id }).first();
  }

  /** The next free place at the end of the list. */
  async nextPosition(): Promise<number> {
    const row = await this.db('spoil_reasons').max({ top: 'position' }).first();
    return Number(row?.['top'] ?? 0) + 10;
  }

  /** Stores a reason and answers its id; a taken label fails with ER_DUP_ENTRY. */
  async insert(row: Omit<SpoilReasonRow, 'id'>): Promise<number> {
    const [id] = await this.db('spoil_reasons').insert(row);
    return id!;
  }

  /** Changes a reason; a taken label fails with ER_DUP_ENTRY. */
  async update(id: number, changes: Partial<Omit<SpoilReasonRow, 'id'>>): Promise<void> {
    await this.db('spoil_reasons').where({ id }).update(changes);
  }
}
