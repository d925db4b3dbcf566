import type { RecipeListItem, RecipeRevision } from '../../src/shared/press/press-contract';
import { celsiusToFahrenheit } from '../../src/shared/press/units';
import type { Db, RecipeRow } from '../db/tables';

/** A recipe's values as stored (°C, s), without its identity and timestamps. */
export type RecipeWrite = Pick<RecipeRow, 'temp_c' | 'dwell_s' | 'pressure_class' | 'peel' | 'pre_press_s' | 'tack_s' | 'second_press_s' | 'notes' | 'source'>;

type RecipeWithNames = RecipeRow & { film_type_name: string; fabric_name: string };

const toListItem = (row: RecipeWithNames): RecipeListItem => ({
  id: row.id,
  filmTypeId: row.film_type_id,
  filmTypeName: row.film_type_name,
  fabricId: row.fabric_id,
  fabricName: row.fabric_name,
  tempC: row.temp_c,
  tempF: Math.round(celsiusToFahrenheit(row.temp_c)),
  dwellS: row.dwell_s,
  pressureClass: row.pressure_class,
  peel: row.peel,
  prePressS: row.pre_press_s,
  tackS: row.tack_s,
  secondPressS: row.second_press_s,
  notes: row.notes,
  source: row.source,
  updatedAt: new Date(row.updated_at).toISOString(),
});

// MariaDB's JSON is LONGTEXT underneath: mysql2 hands it back as a string.
const parseJson = (value: unknown): Record<string, unknown> | null =>
  value === null || value === undefined ? null : typeof value === 'string' ? JSON.parse(value) : (value as Record<string, unknown>);

/** Database access for the Recipe book and its history of changes. */
export class RecipesRepository {
  constructor(private readonly db: Db) {}

  private withNames(db: Db = this.db) {
    return db('recipes')
      .join('film_types', 'film_types.id', 'recipes.film_type_id')
      .join('fabrics', 'fabrics.id', 'recipes.fabric_id')
      .select('recipes.*', 'film_types.name as film_type_name', 'fabrics.name as fabric_name');
  }

  /** Every recipe with its film type and fabric names, by film type then fabric. */
  async list(): Promise<RecipeListItem[]> {
    const rows: RecipeWithNames[] = await this.withNames().orderBy([{ column: 'film_types.name' }, { column: 'fabrics.name' }]);
    return rows.map(toListItem);
  }

  /** One recipe with names, or undefined. */
  async find(id: number): Promise<RecipeListItem | undefined> {
    const row: RecipeWithNames | undefined = await this.withNames().where('recipes.id', id).first();
    return row ? toListItem(row) : undefined;
  }

  /** The recipe for a film type on a fabric, if the book has one. */
  findByPair(filmTypeId: number, fabricId: number): Promise<RecipeRow | undefined> {
    return this.db('recipes').where({ film_type_id: filmTypeId, fabric_id: fabricId }).first();
  }

  /** The name of a film type, or undefined when there is none with that id. */
  async filmTypeName(id: number): Promise<string | undefined> {
    return (await this.db('film_types').where({ id }).first('name'))?.name;
  }

  /** The name of a fabric, or undefined when there is none with that id. */
  async fabricName(id: number): Promise<string | undefined> {
    return (await this.db('fabrics').where({ id }).first('name'))?.name;
  }

  /** Adds a recipe and its first revision in one transaction; returns the new id, or null when the pair already has one. */
  async create(filmTypeId: number, fabricId: number, values: RecipeWrite, changedBy: number | null): Promise<number | null> {
    return this.db.transaction(async (trx) => {
      // Two editors adding the same pair at once: the unique key decides, the loser hears "already has one".
      const [id] = await trx('recipes')
        .insert({ film_type_id: filmTypeId, fabric_id: fabricId, ...values, updated_at: new Date() })
        .onConflict(['film_type_id', 'fabric_id'])
        .ignore();
      if (!id) return null;
      // No RETURNING on MariaDB: re-select what was stored, for the revision's "after".
      const after = await trx('recipes').where({ id }).first();
      await trx('recipe_revisions').insert({ recipe_id: id, changed_by: changedBy, before: null, after: trx.raw('?', [JSON.stringify(after)]) });
      return id;
    });
  }

  /** Changes a recipe and writes the revision (before and after) in one transaction; false when there is no such recipe. */
  update(id: number, values: RecipeWrite, changedBy: number | null): Promise<boolean> {
    return this.db.transaction(async (trx) => {
      const before = await trx('recipes').where({ id }).forUpdate().first();
      if (!before) return false;
      await trx('recipes').where({ id }).update({ ...values, updated_at: new Date() });
      const after = await trx('recipes').where({ id }).first();
      await trx('recipe_revisions').insert({
        recipe_id: id,
        changed_by: changedBy,
        before: trx.raw('?', [JSON.stringify(before)]),
        after: trx.raw('?', [JSON.stringify(after)]),
      });
      return true;
    });
  }

  /** A recipe's history, newest first, with who made each change. */
  async revisions(recipeId: number): Promise<RecipeRevision[]> {
    const rows = await this.db('recipe_revisions')
      .leftJoin('users', 'users.id', 'recipe_revisions.changed_by')
      .where('recipe_revisions.recipe_id', recipeId)
      .orderBy([{ column: 'recipe_revisions.changed_at', order: 'desc' }, { column: 'recipe_revisions.id', order: 'desc' }])
      .select('recipe_revisions.*', 'users.name as changed_by_name');
    return rows.map((row: Record<string, unknown>) => ({
      id: row['id'] as number,
      recipeId: row['recipe_id'] as number,
      changedAt: new Date(row['changed_at'] as Date).toISOString(),
      changedBy: row['changed_by'] === null ? null : { id: row['changed_by'] as number, name: (row['changed_by_name'] as string | null) ?? '' },
      before: parseJson(row['before']),
      after: parseJson(row['after']) ?? {},
    }));
  }
}
