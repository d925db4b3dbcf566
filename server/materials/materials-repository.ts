import type { Db, FabricRow } from '../db/tables';

/** A film with its type, as the job form lists it. */
export interface FilmWithType {
  id: number;
  film_type_id: number;
  film_type_name: string;
  colour: string;
  colour_hex: string;
  wear_class: number;
}

/** Database access for the films and fabrics a job may use. */
export class MaterialsRepository {
  constructor(private readonly db: Db) {}

  /** Films with their type, by type name then colour; only the given ids when asked. */
  films(ids?: readonly number[]): Promise<FilmWithType[]> {
    const query = this.db('films')
      .join('film_types', 'film_types.id', 'films.film_type_id')
      .select<FilmWithType[]>('films.id', 'films.film_type_id', 'film_types.name as film_type_name', 'films.colour', 'films.colour_hex', 'film_types.wear_class')
      .orderBy([{ column: 'film_types.name' }, { column: 'films.colour' }]);
    if (ids) query.whereIn('films.id', ids);
    return query;
  }

  /** Every fabric by name. */
  fabrics(): Promise<FabricRow[]> {
    return this.db('fabrics').orderBy('name');
  }

  /** One fabric by id. */
  fabric(id: number): Promise<FabricRow | undefined> {
    return this.db('fabrics').where({ id }).first();
  }
}
