import type { SpoilPhoto } from '../../src/shared/events-contract';
import type { Db, PhotoRow } from '../db/tables';
import { notFound } from '../http/http-error';
import { cleanPhoto } from './photo-cleaning';
import type { PhotoStore } from './photo-store';
import { PhotosRepository } from './photos-repository';

const toSpoilPhoto = (row: PhotoRow): SpoilPhoto => ({
  eventId: row.event_id,
  mime: row.mime as SpoilPhoto['mime'],
  bytes: row.bytes,
  url: `/api/spoils/${row.event_id}/photo`,
  thumbUrl: `/api/spoils/${row.event_id}/photo/thumb`,
  createdAt: row.created_at.toISOString(),
});

const isDuplicateKey = (err: unknown) => (err as { code?: string }).code === 'ER_DUP_ENTRY';

/** Spoil photos: stored once per spoil event, cleaned of location data, with a thumbnail. */
export class SpoilPhotosService {
  private readonly photos: PhotosRepository;

  constructor(db: Db, private readonly disk: PhotoStore) {
    this.photos = new PhotosRepository(db);
  }

  /** The stored photo of a spoil event, if any; 404 for an unknown event or one that is not a spoil. */
  async existing(eventId: string): Promise<SpoilPhoto | null> {
    const event = await this.photos.event(eventId);
    if (!event) throw notFound(`There is no spoil event ${eventId} on the hub yet. Send the spoil event first, then the photo.`);
    if (event.kind !== 'spoil') throw notFound(`Event ${eventId} is a ${event.kind}, not a spoil: only spoils have photos.`);
    const row = await this.photos.forEvent(eventId);
    return row ? toSpoilPhoto(row) : null;
  }

  /** Stores the photo unless one is stored already; answers the stored photo and whether this call stored it. */
  async store(eventId: string, bytes: Buffer): Promise<{ photo: SpoilPhoto; created: boolean }> {
    const already = await this.existing(eventId);
    if (already) return { photo: already, created: false };
    const clean = await cleanPhoto(bytes);
    const files = await this.disk.save(clean.photo, clean.ext, clean.thumb);
    try {
      await this.photos.insert({ event_id: eventId, file: files.file, thumb_file: files.thumbFile, mime: clean.mime, bytes: clean.photo.length });
    } catch (err) {
      if (!isDuplicateKey(err)) throw err;
      // Another upload of the same photo won the race: keep its files, drop ours.
      await this.disk.remove(files.file, files.thumbFile);
      return { photo: (await this.existing(eventId))!, created: false };
    }
    return { photo: (await this.existing(eventId))!, created: true };
  }

  /** The absolute path of a stored photo or its thumbnail, with its type. */
  async file(eventId: string, which: 'photo' | 'thumb'): Promise<{ path: string; mime: string }> {
    await this.existing(eventId);
    const row = await this.photos.forEvent(eventId);
    const file = row ? (which === 'photo' ? row.file : row.thumb_file) : null;
    const full = file ? await this.disk.pathOf(file) : null;
    if (!row || !full) throw notFound(`No photo is stored for spoil ${eventId} yet. The tablet sends it when it is back online.`);
    return { path: full, mime: which === 'photo' ? row.mime : 'image/jpeg' };
  }
}
