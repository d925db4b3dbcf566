import type { CardFabric, CardFilm, CardFilmType, CardPress, CardRecipe } from '../../src/shared/press/press-card';
import type { ShopUnits } from '../../src/shared/press/units';
import type { Db, PressRow, RecipeRow } from '../db/tables';

/** The bag's job: its fabric and its films in pressing order. */
export interface BagPressing {
  bagId: number;
  bagCode: string;
  fabricId: number;
  layers: CardFilm[];
}

// mysql2 hands DECIMAL columns back as strings.
const decimal = (value: string | number | null): number | null => (value === null ? null : Number(value));

/** A stored press in the units the card computation reads. */
export function toCardPress(row: PressRow): CardPress {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    platenWidthMm: row.platen_width_mm,
    platenHeightMm: row.platen_height_mm,
    boreMm: decimal(row.bore_mm),
    maxGaugeKpa: decimal(row.max_gauge_kpa),
    notes: row.notes,
  };
}

/** A stored recipe as the card computation reads it. */
export function toCardRecipe(row: RecipeRow): CardRecipe {
  return {
    id: row.id,
    filmTypeId: row.film_type_id,
    fabricId: row.fabric_id,
    tempC: row.temp_c,
    dwellS: row.dwell_s,
    pressureClass: row.pressure_class,
    peel: row.peel,
    prePressS: row.pre_press_s,
    tackS: row.tack_s,
    secondPressS: row.second_press_s,
    notes: row.notes,
    source: row.source,
  };
}

/** Database reads for resolving press cards: presses, fabrics, films, recipes, bags and the shop's limits. */
export class PressRepository {
  constructor(private readonly db: Db) {}

  /** Every press, by name. */
  async listPresses(): Promise<CardPress[]> {
    return (await this.db('presses').orderBy('name')).map(toCardPress);
  }

  /** One press by id. */
  async findPress(id: number): Promise<CardPress | undefined> {
    const row = await this.db('presses').where({ id }).first();
    return row ? toCardPress(row) : undefined;
  }

  /** One fabric by id. */
  async findFabric(id: number): Promise<CardFabric | undefined> {
    const row = await this.db('fabrics').where({ id }).first();
    return row ? { id: row.id, name: row.name, maxTempC: row.max_temp_c } : undefined;
  }

  /** The films with these ids (in no particular order; missing ids are left out). */
  async findFilms(ids: number[]): Promise<CardFilm[]> {
    if (ids.length === 0) return [];
    const rows = await this.db('films').whereIn('id', ids).select('id', 'film_type_id', 'colour');
    return rows.map((row) => ({ filmId: row.id, filmTypeId: row.film_type_id, colour: row.colour }));
  }

  /** Every film type with its low-temperature partner. */
  async filmTypes(): Promise<CardFilmType[]> {
    const rows = await this.db('film_types').select('id', 'name', 'low_temp_film_type_id');
    return rows.map((row) => ({ id: row.id, name: row.name, lowTempFilmTypeId: row.low_temp_film_type_id }));
  }

  /** Every recipe for one fabric (the card also needs the low-temperature films' recipes). */
  async recipesForFabric(fabricId: number): Promise<CardRecipe[]> {
    return (await this.db('recipes').where({ fabric_id: fabricId })).map(toCardRecipe);
  }

  /** A bag's fabric and layers (bag -> job -> job_layers -> films), or undefined for no such bag. */
  async bagPressing(bagId: number): Promise<BagPressing | undefined> {
    const bag = await this.db('bags').join('jobs', 'jobs.id', 'bags.job_id').where('bags.id', bagId).first('bags.id', 'bags.code', 'bags.job_id', 'jobs.fabric_id');
    if (!bag) return undefined;
    const layers = await this.db('job_layers')
      .join('films', 'films.id', 'job_layers.film_id')
      .where('job_layers.job_id', bag.job_id)
      .orderBy('job_layers.position')
      .select('films.id as filmId', 'films.film_type_id as filmTypeId', 'films.colour as colour');
    return { bagId: bag.id, bagCode: bag.code, fabricId: bag.fabric_id, layers };
  }

  /** The shop's heat-exposure limit and display units (defaults when the shop row is missing). */
  async shopPressSettings(): Promise<{ heatExposureLimitS: number; units: ShopUnits }> {
    const row = await this.db('shop_settings').where({ id: 1 }).first('heat_exposure_limit_s', 'units');
    return { heatExposureLimitS: row?.heat_exposure_limit_s ?? 45, units: row?.units ?? 'imperial' };
  }
}
