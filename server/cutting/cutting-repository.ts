import type { Knex } from 'knex';
import type { CutterRow, Db, FilmRow, FilmTypeRow, RollRow } from '../db/tables';
import { rollsWithFilm } from '../rolls/rolls-repository';
import type { RollWithFilm } from '../rolls/roll-view';

/** One layer film of a queued bag that is not cut yet, with what the layout and estimate need. */
export interface QueuedLayer {
  bag_id: number;
  bag_code: string;
  order_code: string;
  job_id: number;
  job_name: string;
  pieces: number;
  design_width_mm: number;
  design_height_mm: number;
  rotation_allowed: boolean | number;
  design_file: string | null;
  design_mime: string | null;
  position: number;
  layer_count: number;
  film_id: number;
  film_type_id: number;
  film_type_name: string;
  colour: string;
  colour_hex: string;
}

/** A film with its type. */
export type FilmWithType = FilmRow & Pick<FilmTypeRow, 'name' | 'wear_class' | 'cut_force_g' | 'cut_speed_mm_s' | 'blade_angle_deg'>;

/** What a confirmed cut writes; the deduction is computed by the caller from the locked roll. */
export interface CutRecord {
  rollId: number;
  filmId: number;
  filmTypeId: number;
  cutterId: number;
  bagIds: number[];
  lengthMm: number;
  testCutMm: number;
  bladeDistanceMm: number;
  userId: number | null;
  /** Computes the roll's new stock from the locked row, or throws to refuse the cut. */
  deduct(roll: RollRow): { remainingMm: number };
  /** Runs inside the same transaction once the cut is written, with the bags whose every layer is now cut. */
  recordEvents(trx: Db, completeBagIds: number[]): Promise<void>;
  /** Runs inside the same transaction once the roll is shortened (e.g. to report it running low). */
  afterRollChange?(trx: Db, rollId: number): Promise<unknown>;
}

/** Thrown inside the confirm transaction when a bag is no longer waiting for this film. */
export class BagNotWaitingError extends Error {
  constructor(readonly bagIds: number[]) {
    super('A bag is no longer waiting for this film.');
  }
}

/** Database access for cut planning: queued bags by film, and writing a confirmed cut. */
export class CuttingRepository {
  constructor(private readonly db: Db) {}

  /** Layer films still to cut on queued bags of open orders; narrowed to some bags or one film. */
  async queuedLayers(filter: { bagIds?: number[]; filmId?: number } = {}): Promise<QueuedLayer[]> {
    return (await queuedLayersQuery(this.db, filter)) as QueuedLayer[];
  }

  /** One film with its type's cut preset. */
  async film(id: number): Promise<FilmWithType | undefined> {
    return (await this.db('films')
      .join('film_types', 'film_types.id', 'films.film_type_id')
      .where('films.id', id)
      .first('films.*', 'film_types.name', 'film_types.wear_class', 'film_types.cut_force_g', 'film_types.cut_speed_mm_s', 'film_types.blade_angle_deg')) as FilmWithType | undefined;
  }

  /** One cutter. */
  cutter(id: number): Promise<CutterRow | undefined> {
    return this.db('cutters').where({ id }).first();
  }

  /** Rolls of a film with film left. */
  async rollsOfFilm(filmId: number): Promise<RollWithFilm[]> {
    return (await rollsWithFilm(this.db).where('rolls.film_id', filmId).where('rolls.remaining_mm', '>', 0).orderBy('rolls.label')) as RollWithFilm[];
  }

  /** One roll with its film. */
  async roll(id: number): Promise<RollWithFilm | undefined> {
    return (await rollsWithFilm(this.db).where('rolls.id', id).first()) as RollWithFilm | undefined;
  }

  /** The shop's display units. */
  async shopUnits(): Promise<'imperial' | 'metric'> {
    const row = await this.db('shop_settings').where({ id: 1 }).first('units');
    return row?.units ?? 'imperial';
  }

  /**
   * Writes a confirmed cut in one transaction: the roll's new stock, the cutter's blade distance and
   * last film, the roll's movement, the bags' cut layers, and (through the callback) the events.
   */
  confirmCut(cut: CutRecord): Promise<{ movementId: number; completeBagIds: number[] }> {
    return this.db.transaction(async (trx) => {
      const roll = await trx('rolls').where({ id: cut.rollId }).forUpdate().first();
      const { remainingMm } = cut.deduct(roll!);
      const waiting = (await queuedLayersQuery(trx, { bagIds: cut.bagIds, filmId: cut.filmId }).forUpdate()) as QueuedLayer[];
      const missing = cut.bagIds.filter((id) => !waiting.some((layer) => layer.bag_id === id));
      if (missing.length > 0) throw new BagNotWaitingError(missing);

      await trx('rolls').where({ id: cut.rollId }).update({ remaining_mm: remainingMm, emptied_at: remainingMm === 0 ? new Date() : null });
      await trx('cutters')
        .where({ id: cut.cutterId })
        .update({ blade_distance_mm: trx.raw('blade_distance_mm + ?', [Math.round(cut.bladeDistanceMm)]) as never, last_film_type_id: cut.filmTypeId });
      const [movementId] = await trx('roll_movements').insert({
        roll_id: cut.rollId,
        kind: 'cut',
        change_mm: remainingMm - roll!.remaining_mm,
        remaining_mm: remainingMm,
        cut_length_mm: Math.round(cut.lengthMm),
        test_cut_mm: cut.testCutMm > 0 ? Math.round(cut.testCutMm) : null,
        cutter_id: cut.cutterId,
        user_id: cut.userId,
        bag_ids: trx.raw('?', [JSON.stringify(cut.bagIds)]) as never,
        note: '',
      });
      await trx('bag_layer_cuts').insert(cut.bagIds.map((bagId) => ({ bag_id: bagId, film_id: cut.filmId, roll_movement_id: movementId! })));
      const completeBagIds = waiting.filter((layer) => layer.layer_count <= 1).map((layer) => layer.bag_id);
      const multi = waiting.filter((layer) => layer.layer_count > 1).map((layer) => layer.bag_id);
      if (multi.length > 0) {
        const rows = (await trx('bags')
          .join('job_layers', 'job_layers.job_id', 'bags.job_id')
          .leftJoin('bag_layer_cuts', function () {
            this.on('bag_layer_cuts.bag_id', '=', 'bags.id').andOn('bag_layer_cuts.film_id', '=', 'job_layers.film_id');
          })
          .whereIn('bags.id', multi)
          .groupBy('bags.id')
          .select('bags.id')
          .count({ layers: 'job_layers.id' })
          .count({ cut: 'bag_layer_cuts.id' })) as { id: number; layers: number | string; cut: number | string }[];
        for (const row of rows) if (Number(row.cut) >= Number(row.layers)) completeBagIds.push(row.id);
      }
      await cut.recordEvents(trx, completeBagIds);
      await cut.afterRollChange?.(trx, cut.rollId);
      return { movementId: movementId!, completeBagIds };
    });
  }
}

function queuedLayersQuery(db: Knex | Knex.Transaction, filter: { bagIds?: number[]; filmId?: number }) {
  const query = db('bags')
    .join('orders', 'orders.id', 'bags.order_id')
    .join('jobs', 'jobs.id', 'bags.job_id')
    .join('job_layers', 'job_layers.job_id', 'jobs.id')
    .join('films', 'films.id', 'job_layers.film_id')
    .join('film_types', 'film_types.id', 'films.film_type_id')
    .where('bags.stage', 'queued')
    .where('orders.status', 'open')
    .whereNotExists(function () {
      this.select(db.raw('1')).from('bag_layer_cuts').whereRaw('bag_layer_cuts.bag_id = bags.id AND bag_layer_cuts.film_id = job_layers.film_id');
    })
    .select(
      'bags.id as bag_id',
      'bags.code as bag_code',
      'orders.code as order_code',
      'jobs.id as job_id',
      'jobs.name as job_name',
      'bags.pieces',
      'jobs.design_width_mm',
      'jobs.design_height_mm',
      'jobs.rotation_allowed',
      'jobs.design_file',
      'jobs.design_mime',
      'job_layers.position',
      db.raw('(SELECT COUNT(*) FROM job_layers AS all_layers WHERE all_layers.job_id = jobs.id) AS layer_count'),
      'films.id as film_id',
      'films.film_type_id',
      'film_types.name as film_type_name',
      'films.colour',
      'films.colour_hex',
    )
    .orderBy(['orders.due_at', 'bags.id', 'job_layers.position']);
  if (filter.bagIds) query.whereIn('bags.id', filter.bagIds);
  if (filter.filmId !== undefined) query.where('job_layers.film_id', filter.filmId);
  return query;
}
