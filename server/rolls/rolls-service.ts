import type { RollCreate, RollMovement, RollView } from '../../src/shared/cutting/cut-plan-contract';
import type { Db } from '../db/tables';
import { badRequest, conflict, notFound } from '../http/http-error';
import { RollsRepository } from './rolls-repository';
import { toRollMovement, toRollView } from './roll-view';

/** The roll rack: list, receive, measure and the history of each roll. */
export class RollsService {
  private readonly rolls: RollsRepository;

  constructor(db: Db) {
    this.rolls = new RollsRepository(db);
  }

  /** Every roll, low ones flagged. */
  async list(filmId?: number): Promise<RollView[]> {
    return (await this.rolls.list(filmId)).map(toRollView);
  }

  /** Puts a new (or partly used) roll on the rack. */
  async create(input: RollCreate, userId: number | null): Promise<RollView> {
    const remaining = input.remainingMm ?? input.lengthMm;
    if (remaining > input.lengthMm) {
      throw badRequest('A roll cannot have more film left than it had when new: check the remaining length.', [
        { path: 'remainingMm', message: 'At most the length when new.' },
      ]);
    }
    if (!(await this.rolls.filmExists(input.filmId))) throw badRequest('Choose a film from the list: that one does not exist.', [{ path: 'filmId', message: 'No such film.' }]);
    const label = input.label.trim();
    if (await this.rolls.labelTaken(label)) throw conflict(`Roll ${label} is already on the rack: write another label on the core.`);
    const id = await this.rolls.create(
      {
        film_id: input.filmId,
        label,
        width_mm: input.widthMm,
        length_mm: input.lengthMm,
        remaining_mm: remaining,
        reorder_mm: input.reorderMm,
        rack_slot: (input.rackSlot ?? '').trim(),
      },
      userId,
    );
    return toRollView((await this.rolls.find(id))!);
  }

  /** Records a physical measure of what is left on a roll. */
  async measure(id: number, remainingMm: number, note: string, userId: number | null): Promise<RollView> {
    const roll = await this.rolls.find(id);
    if (!roll) throw notFound(`There is no roll ${id}. Reload the Roll rack.`);
    if (remainingMm > roll.length_mm) {
      throw badRequest(`Roll ${roll.label} held ${roll.length_mm} mm when new: a measure cannot be more than that.`, [
        { path: 'remainingMm', message: `At most ${roll.length_mm} mm.` },
      ]);
    }
    await this.rolls.measure(id, remainingMm, note.trim(), userId);
    return toRollView((await this.rolls.find(id))!);
  }

  /** A roll's history, newest first. */
  async movements(id: number): Promise<RollMovement[]> {
    if (!(await this.rolls.find(id))) throw notFound(`There is no roll ${id}. Reload the Roll rack.`);
    const rows = await this.rolls.movements(id);
    const bagIds = [...new Set(rows.flatMap((row) => (typeof row.bag_ids === 'string' ? (JSON.parse(row.bag_ids) as number[]) : (row.bag_ids ?? []))))];
    const codes = await this.rolls.bagCodes(bagIds);
    return rows.map((row) => toRollMovement(row, codes));
  }
}
