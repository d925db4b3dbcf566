import type { CustomerRow, Db } from '../db/tables';

/** Escapes LIKE wildcards so a search for "50%" finds "50%" and not everything. */
export const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/** Database access for the shop's customers. */
export class CustomersRepository {
  constructor(private readonly db: Db) {}

  /** Customers whose name or contact matches the search, by name; at most `limit`. */
  search(q: string, limit: number): Promise<CustomerRow[]> {
    const query = this.db('customers').orderBy('name').limit(limit);
    if (q) query.where((w) => w.where('name', 'like', likePattern(q)).orWhere('contact_name', 'like', likePattern(q)));
    return query;
  }

  /** One customer by id. */
  find(id: number): Promise<CustomerRow | undefined> {
    return this.db('customers').where({ id }).first();
  }

  /** Stores a new customer and answers its id. */
  async insert(customer: Pick<CustomerRow, 'name' | 'contact_name' | 'email' | 'phone'>): Promise<number> {
    const [id] = await this.db('customers').insert({ ...customer, notes: '' });
    return id!;
  }
}
