import { noSpoils } from '../../src/shared/events/bag-progress';
import type { StationKind } from '../../src/shared/names';
import type { BagRow, Db } from '../db/tables';

/** Pieces spoiled on a bag, by the stage they were spoiled at. */
export type SpoiledAt = Record<StationKind, number>;

/** Pieces spoiled per stage for each bag asked about; a bag with no spoils has zeros. */
export type SpoiledAtByBag = ReadonlyMap<number, SpoiledAt>;

/** A bag about to be stored, with the roster lines (by id) that go in it. */
export interface NewBag {
  code: string;
  token: string;
  sizes: Record<string, number>;
  pieces: number;
  rosterLineIds: number[];
}

/** Database access for job bags. */
export class BagsRepository {
  constructor(private readonly db: Db) {}

  /** An order's bags by code order (A before B before AA). */
  forOrder(orderId: number): Promise<BagRow[]> {
    return this.db('bags').where({ order_id: orderId }).orderByRaw('CHAR_LENGTH(code), code');
  }

  /** The shop's usual most pieces per bag (shop settings). */
  async defaultMaxPieces(): Promise<number> {
    const settings = await this.db('shop_settings').first('bag_max_pieces');
    return settings?.bag_max_pieces ?? 24;
  }

  /** Pieces spoiled per bag and stage over each bag's whole life, in one grouped query. */
  async spoiledAtByBag(bagIds: readonly number[]): Promise<SpoiledAtByBag> {
    const out = new Map<number, SpoiledAt>(bagIds.map((id) => [id, noSpoils()]));
    if (bagIds.length === 0) return out;
    const rows = (await this.db('spoils').whereIn('bag_id', [...new Set(bagIds)]).groupBy('bag_id', 'stage').select('bag_id', 'stage').sum({ pieces: 'quantity' })) as {
      bag_id: number;
      stage: StationKind;
      pieces: string | number;
    }[];
    // MariaDB answers SUM over an integer column as a DECIMAL, which mysql2 hands over as a string.
    for (const row of rows) out.get(row.bag_id)![row.stage] = Number(row.pieces);
    return out;
  }

  /** One bag by its token. */
  byToken(token: string): Promise<BagRow | undefined> {
    return this.db('bags').where({ token }).first();
  }

  /** One bag by id. */
  find(id: number): Promise<BagRow | undefined> {
    return this.db('bags').where({ id }).first();
  }

  /** How many of a job's bags have left the queue. */
  async countPastQueued(where: { jobId?: number; orderId?: number; stage?: BagRow['stage'] }): Promise<number> {
    const query = this.db('bags').whereNot('stage', 'queued');
    if (where.jobId !== undefined) query.where({ job_id: where.jobId });
    if (where.orderId !== undefined) query.where({ order_id: where.orderId });
    if (where.stage) query.where({ stage: where.stage });
    const [row] = await query.count({ n: '*' });
    return Number(row?.['n'] ?? 0);
  }

  /**
   * Replaces a job's queued bags with new ones in one transaction and points roster lines at them.
   * `codesFor` gets the codes the order's other bags keep, so letters continue across the order.
   */
  replaceQueuedBags(orderId: number, jobId: number, makeBags: (codesKept: string[]) => NewBag[]): Promise<BagRow[]> {
    return this.db.transaction<BagRow[]>(async (trx) => {
      // Lock the order's bags so two splits of the same order cannot hand out the same letters.
      await trx('orders').where({ id: orderId }).forUpdate().first('id');
      const pastQueued = await trx('bags').where({ job_id: jobId }).whereNot('stage', 'queued').forUpdate().first('id');
      if (pastQueued) throw new BagsAlreadyStartedError();
      await trx('roster_lines').where({ job_id: jobId }).update({ bag_id: null });
      await trx('bags').where({ job_id: jobId }).del();
      const kept = (await trx('bags').where({ order_id: orderId }).select('code')).map((row) => row.code);
      for (const bag of makeBags(kept)) {
        const [bagId] = await trx('bags').insert({
          order_id: orderId,
          job_id: jobId,
          code: bag.code,
          token: bag.token,
          sizes: trx.raw('?', [JSON.stringify(bag.sizes)]) as never,
          pieces: bag.pieces,
        });
        for (let i = 0; i < bag.rosterLineIds.length; i += 1000) {
          await trx('roster_lines').whereIn('id', bag.rosterLineIds.slice(i, i + 1000)).update({ bag_id: bagId! });
        }
      }
      const bags: BagRow[] = await trx('bags').where({ job_id: jobId }).orderByRaw('CHAR_LENGTH(code), code');
      return bags;
    });
  }
}

/** Thrown inside the split transaction when a bag of the job has already been worked on. */
export class BagsAlreadyStartedError extends Error {
  constructor() {
    super('A bag of this job has left the queue.');
  }
}
