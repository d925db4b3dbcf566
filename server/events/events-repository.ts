import type { StationKind } from '../../src/shared/names';
import { BagsRepository } from '../bags/bags-repository';
import type { BagRow, Db, EventRow, OrderRow, SpoilRow, StationRow } from '../db/tables';

/** The bag an event is about, locked for the event's transaction, with its order's status. */
export type LockedBag = BagRow & { order_status: OrderRow['status'] };

/** An event row about to be stored (seq and server_at are the hub's). */
export type NewEvent = Omit<EventRow, 'seq' | 'server_at'>;

/** The bag's new counts, stage and flag. */
export type BagCountsUpdate = Pick<BagRow, 'qty_cut' | 'qty_weeded' | 'qty_pressed' | 'qty_packed' | 'qty_spoiled' | 'remake_count' | 'stage' | 'over_count'>;

// Microseconds since the epoch on the database clock, never below the bag's last version + 1.
const NEXT_VERSION = 'GREATEST(version + 1, CAST(UNIX_TIMESTAMP(NOW(6)) * 1000000 AS UNSIGNED))';

/** Database access for station events: storing them and the bag counts they move, in one transaction. */
export class EventsRepository {
  constructor(private readonly db: Db) {}

  /** Runs work in a transaction (a savepoint when this repository already sits on one). */
  inTransaction<T>(work: (repository: EventsRepository) => Promise<T>): Promise<T> {
    return this.db.transaction((trx) => work(new EventsRepository(trx)));
  }

  /** Whether an event with this id is already stored. */
  async exists(id: string): Promise<boolean> {
    return Boolean(await this.db('events').where({ id }).first('id'));
  }

  /** A station by id. */
  station(id: number): Promise<StationRow | undefined> {
    return this.db('stations').where({ id }).first();
  }

  /** The bag with its order's status, locked until the transaction ends. */
  lockBag(bagId: number): Promise<LockedBag | undefined> {
    return this.db('bags')
      .join('orders', 'orders.id', 'bags.order_id')
      .where('bags.id', bagId)
      .forUpdate()
      .first<LockedBag | undefined>('bags.*', 'orders.status as order_status');
  }

  /** Whether this spoil reason exists and is active. */
  async activeReason(id: number): Promise<boolean> {
    return Boolean(await this.db('spoil_reasons').where({ id, active: true }).first('id'));
  }

  /** Pieces spoiled on this bag so far, by the stage they were spoiled at (read in this transaction). */
  async spoiledByStage(bagId: number): Promise<Record<StationKind, number>> {
    return (await new BagsRepository(this.db).spoiledAtByBag([bagId])).get(bagId)!;
  }

  /** Names of other stations that already reported this kind of event on this bag. */
  async otherReporters(bagId: number, kind: EventRow['kind'], stationId: number): Promise<string[]> {
    const rows = await this.db('events')
      .join('stations', 'stations.id', 'events.station_id')
      .where('events.bag_id', bagId)
      .andWhere('events.kind', kind)
      .whereNot('events.station_id', stationId)
      .distinct('stations.name');
    return rows.map((row: { name: string }) => row.name);
  }

  /** Stores an event; a second insert of the same id fails with ER_DUP_ENTRY. */
  async insertEvent(event: NewEvent): Promise<void> {
    await this.db('events').insert({ ...event, payload: this.db.raw('?', [JSON.stringify(event.payload)]) as never });
  }

  /** Stores the spoil row that goes with a spoil event. */
  async insertSpoil(spoil: Omit<SpoilRow, 'id' | 'created_at'>): Promise<void> {
    await this.db('spoils').insert(spoil);
  }

  /** Writes the bag's counts and gives it a new hub-wide version; answers that version. */
  async updateBag(bagId: number, update: BagCountsUpdate): Promise<number> {
    // A statement of its own after the lock: NOW(6) is read when this statement starts, not while waiting.
    await this.db('bags').where({ id: bagId }).update({ ...update, updated_at: new Date(), version: this.db.raw(NEXT_VERSION) as never });
    const row = await this.db('bags').where({ id: bagId }).first('version');
    return Number(row!.version);
  }

  /** Records that the station synced now. */
  async markSynced(stationId: number, at: Date): Promise<void> {
    await this.db('stations').where({ id: stationId }).update({ last_sync_at: at });
  }
}
