import type { StationSummary } from '../../src/shared/auth-contract';
import type { CutterRow, Db, FilmTypeRow } from '../db/tables';

/** Database access for cutters, their blades and their remembered forces. */
export class CuttersRepository {
  constructor(private readonly db: Db) {}

  /** Every cutter by name. */
  list(): Promise<CutterRow[]> {
    return this.db('cutters').orderBy('name');
  }

  /** One cutter. */
  find(id: number): Promise<CutterRow | undefined> {
    return this.db('cutters').where({ id }).first();
  }

  /** One film type. */
  filmType(id: number): Promise<FilmTypeRow | undefined> {
    return this.db('film_types').where({ id }).first();
  }

  /** The wear class of the film type this cutter cut last, or null. */
  async lastFilmWearClass(cutter: CutterRow): Promise<number | null> {
    if (cutter.last_film_type_id === null) return null;
    const row = await this.db('film_types').where({ id: cutter.last_film_type_id }).first('wear_class');
    return row?.wear_class ?? null;
  }

  /** The force that last tested clean on this cutter for this film type, or null. */
  async testedForce(cutterId: number, filmTypeId: number): Promise<number | null> {
    const row = await this.db('cutter_film_forces').where({ cutter_id: cutterId, film_type_id: filmTypeId }).first('force_g');
    return row?.force_g ?? null;
  }

  /** The cut station that works this cutter, if one does. */
  async cutStation(cutterId: number): Promise<StationSummary | null> {
    const row = await this.db('stations').where({ cutter_id: cutterId, kind: 'cut' }).orderBy('id').first('id', 'name', 'kind');
    return row ? { id: row.id, name: row.name, kind: row.kind } : null;
  }

  /** The highest change number among these bags, for telling stations what to pull. */
  async bagsVersion(bagIds: number[]): Promise<number> {
    if (bagIds.length === 0) return 0;
    const row = await this.db('bags').whereIn('id', bagIds).max({ v: 'version' }).first();
    return Number(row?.['v'] ?? 0);
  }

  /** Whether a bag exists. */
  async bagExists(bagId: number): Promise<boolean> {
    return Boolean(await this.db('bags').where({ id: bagId }).first('id'));
  }

  /**
   * A passed test cut: the test is on record at the blade's current distance, the blade has now cut
   * this film type, and the clean force is remembered for this cutter and film type.
   */
  recordPassedTest(cutterId: number, filmTypeId: number, forceG: number, at: Date): Promise<void> {
    return this.db.transaction(async (trx) => {
      const cutter = await trx('cutters').where({ id: cutterId }).forUpdate().first();
      await trx('cutters')
        .where({ id: cutterId })
        .update({ last_test_cut_at: at, distance_at_last_test_mm: cutter!.blade_distance_mm, last_film_type_id: filmTypeId });
      await trx('cutter_film_forces')
        .insert({ cutter_id: cutterId, film_type_id: filmTypeId, force_g: forceG, tested_at: at })
        .onConflict(['cutter_id', 'film_type_id'])
        .merge(['force_g', 'tested_at']);
    });
  }

  /** A fresh blade: no distance on it, and a test cut due because it went in after the last test. */
  async bladeChanged(cutterId: number, at: Date): Promise<void> {
    await this.db('cutters').where({ id: cutterId }).update({ blade_installed_at: at, blade_distance_mm: 0, distance_at_last_test_mm: 0 });
  }
}
