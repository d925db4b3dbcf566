import type { SpoilReason } from '../../src/shared/events-contract';
import type { Db, SpoilReasonRow } from '../db/tables';
import { conflict, notFound } from '../http/http-error';
import { SpoilReasonsRepository } from './spoil-reasons-repository';

/** A reason as the API shows it. */
const toSpoilReason = (row: SpoilReasonRow): SpoilReason => ({ id: row.id, label: row.label, position: row.position, active: Boolean(row.active) });

const isDuplicateKey = (err: unknown) => (err as { code?: string }).code === 'ER_DUP_ENTRY';

/**
 * The spoil reasons list the lead edits. Reasons are never deleted, only deactivated, because
 * stored spoils point at them; an inactive reason is refused on new spoil events.
 */
export class SpoilReasonsService {
  private readonly reasons: SpoilReasonsRepository;

  constructor(db: Db) {
    this.reasons = new SpoilReasonsRepository(db);
  }

  /** Every reason, active and not, in list order. */
  async list(): Promise<SpoilReason[]> {
    return (await this.reasons.list()).map(toSpoilReason);
  }

  /** Adds a reason (at the end of the list unless a position is given). */
  async create(input: { label: string; position?: number; active?: boolean }): Promise<SpoilReason> {
    const position = input.position ?? (await this.reasons.nextPosition());
    const id = await this.reasons.insert({ label: input.label, position, active: input.active ?? true }).catch((err: unknown) => {
      throw isDuplicateKey(err) ? conflict(`There is already a spoil reason called "${input.label}". Use that one or pick another name.`) : err;
    });
    return toSpoilReason((await this.reasons.find(id))!);
  }

  /** Renames, moves, deactivates or reactivates a reason. */
  async update(id: number, changes: { label?: string; position?: number; active?: boolean }): Promise<SpoilReason> {
    if (!(await this.reasons.find(id))) throw notFound(`There is no spoil reason ${id}. Reload the list.`);
    await this.reasons.update(id, changes).catch((err: unknown) => {
      throw isDuplicateKey(err) ? conflict(`There is already a spoil reason called "${changes.label}". Pick another name.`) : err;
    });
    return toSpoilReason((await this.reasons.find(id))!);
  }
}
