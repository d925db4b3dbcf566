import type { Knex } from 'knex';
import type { Db, RollRow } from '../db/tables';
import type { MovementWithNames, RollWithFilm } from './roll-view';

/** A roll about to be put on the rack. */
export type NewRoll = Pick<RollRow, 'film_id' | 'label' | 'width_mm' | 'length_mm' | 'remaining_mm' | 'reorder_mm' | 'rack_slot'>;

/** Selects rolls with their film type's name and the film's colour. */
export function rollsWithFilm(db: Knex | Knex.Transaction) {
  return db('rolls')
    .join('films', 'films.id', 'rolls.film_id')
    .join('film_types', 'film_types.id', 'films.film_type_id')
    .select('rolls.*', 'film_types.name as film_type_name', 'films.colour', 'films.colour_hex');
}

/** Database access for the roll rack and its history. */
export class RollsRepository {
  constructor(private readonly db: Db) {}

  /** Rolls still holding film (or every roll), by film type, colour and label. */
  async list(filmId?: number): Promise<RollWithFilm[]> {
    const query = rollsWithFilm(this.db).orderBy(['film_types.name', 'films.colour', 'rolls.label']);
    if (filmId !== undefined) query.where('rolls.film_id', filmId);
    return (await query) as RollWithFilm[];
  }

  /** One roll with its film. */
  async find(id: number): Promise<RollWithFilm | undefined> {
    return (await rollsWithFilm(this.db).where('rolls.id', id).first()) as RollWithFilm | undefined;
  }

  /** Whether a film exists. */
  async filmExists(filmId: number): Promise<boolean> {
    return Boolean(await this.db('films').where({ id: filmId }).first('id'));
  }

  /** Whether a label is already written on another roll's core. */
  async labelTaken(label: string): Promise<boolean> {
    return Boolean(await this.db('rolls').where({ label }).first('id'));
  }

  /** Puts a roll on the rack and writes its "received" movement, together. */
  create(roll: NewRoll, userId: number | null): Promise<number> {
    return this.db.transaction(async (trx) => {
      const [id] = await trx('rolls').insert(roll);
      await trx('roll_movements').insert({
        roll_id: id!,
        kind: 'received',
        change_mm: roll.remaining_mm,
        remaining_mm: roll.remaining_mm,
        user_id: userId,
        note: roll.remaining_mm < roll.length_mm ? `Received partly used (${roll.length_mm} mm when new).` : '',
      });
      return id!;
    });
  }

  /** Sets a roll's remaining length from a physical measure and writes the movement; false when there is no such roll. */
  measure(id: number, remainingMm: number, note: string, userId: number | null): Promise<boolean> {
    return this.db.transaction(async (trx) => {
      const roll = await trx('rolls').where({ id }).forUpdate().first();
      if (!roll) return false;
      await trx('rolls')
        .where({ id })
        .update({
          remaining_mm: remainingMm,
          emptied_at: remainingMm === 0 ? trx.fn.now(3) : null,
          // Back at or above its reorder length (restocked, or measured longer): the next time it runs low, tell the lead again.
          ...(remainingMm >= roll.reorder_mm ? { low_notified_at: null } : {}),
        });
      await trx('roll_movements').insert({
        roll_id: id,
        kind: 'measure',
        change_mm: remainingMm - roll.remaining_mm,
        remaining_mm: remainingMm,
        user_id: userId,
        note,
      });
      return true;
    });
  }

  /** Marks a low roll as reported; false when it was reported already (another cut got there first). */
  async markLowNotified(id: number, at: Date): Promise<boolean> {
    return (await this.db('rolls').where({ id }).whereNull('low_notified_at').update({ low_notified_at: at })) === 1;
  }

  /** A roll's history, newest first. */
  async movements(rollId: number): Promise<MovementWithNames[]> {
    return (await this.db('roll_movements')
      .leftJoin('cutters', 'cutters.id', 'roll_movements.cutter_id')
      .leftJoin('users', 'users.id', 'roll_movements.user_id')
      .where('roll_movements.roll_id', rollId)
      .orderBy([{ column: 'roll_movements.created_at', order: 'desc' }, { column: 'roll_movements.id', order: 'desc' }])
      .select('roll_movements.*', 'cutters.name as cutter_name', 'users.name as user_name')) as MovementWithNames[];
  }

  /** Bag codes by id, for the history's "which bags" column. */
  async bagCodes(ids: number[]): Promise<Map<number, string>> {
    if (ids.length === 0) return new Map();
    const rows = await this.db('bags').whereIn('id', ids).select('id', 'code');
    return new Map(rows.map((row) => [row.id, row.code]));
  }
}
