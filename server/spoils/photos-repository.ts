import type { Db, EventRow, PhotoRow } from '../db/tables';

/** Database access for spoil photos. */
export class PhotosRepository {
  constructor(private readonly db: Db) {}

  /** The event a photo belongs to (its kind decides whether it may have one). */
  event(id: string): Promise<Pick<EventRow, 'id' | 'kind'> | undefined> {
    return this.db('events').where({ id }).first('id', 'kind');
  }

  /** The photo stored for an event, if any. */
  forEvent(eventId: string): Promise<PhotoRow | undefined> {
    return this.db('photos').where({ event_id: eventId }).first();
  }

  /** Stores a photo row; a second photo for the same event fails with ER_DUP_ENTRY (photos.event_id is unique). */
  async insert(row: Omit<PhotoRow, 'id' | 'created_at'>): Promise<void> {
    await this.db('photos').insert(row);
  }
}
