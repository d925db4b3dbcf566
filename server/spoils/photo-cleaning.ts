import { fromBuffer } from 'file-type';
import sharp from 'sharp';
import { HttpError } from '../http/http-error';

/** The largest spoil photo the hub accepts; a tablet camera's JPEG is 2 to 5 MB. */
export const MAX_PHOTO_BYTES = 10 * 1024 * 1024;
/** Thumbnail width for the board and the spoil list. */
export const THUMB_WIDTH_PX = 320;

const ACCEPTED = {
  'image/jpeg': { ext: 'jpg', format: 'jpeg' },
  'image/png': { ext: 'png', format: 'png' },
  'image/webp': { ext: 'webp', format: 'webp' },
} as const;

/** A photo as the hub keeps it: re-encoded without metadata, with its thumbnail. */
export interface CleanPhoto {
  mime: keyof typeof ACCEPTED;
  ext: (typeof ACCEPTED)[keyof typeof ACCEPTED]['ext'];
  photo: Buffer;
  thumb: Buffer;
}

/**
 * Checks the type by the bytes (not the name or the header the browser sent) and re-encodes the
 * photo: `.rotate()` applies the camera's orientation, and leaving out `.withMetadata()` drops all
 * EXIF, including the GPS position the tablet may have written.
 */
export async function cleanPhoto(bytes: Buffer): Promise<CleanPhoto> {
  const detected = await fromBuffer(bytes);
  const mime = detected?.mime as string | undefined;
  if (mime === 'image/heic' || mime === 'image/heif') {
    // The image library on the hub reads AVIF but not HEVC-coded HEIC photos.
    throw new HttpError(415, 'HEIC photos cannot be read by the hub. Set the tablet camera to JPEG ("Most Compatible") and take the photo again.');
  }
  if (!mime || !(mime in ACCEPTED)) throw new HttpError(415, 'The photo must be a JPEG, PNG or WebP image. Take the photo again with the tablet camera.');
  const { ext, format } = ACCEPTED[mime as keyof typeof ACCEPTED];
  try {
    const photo = await sharp(bytes).rotate().toFormat(format).toBuffer();
    const thumb = await sharp(bytes).rotate().resize({ width: THUMB_WIDTH_PX, withoutEnlargement: true }).jpeg({ quality: 80 }).toBuffer();
    return { mime: mime as CleanPhoto['mime'], ext, photo, thumb };
  } catch {
    throw new HttpError(422, 'The photo looks damaged and could not be read. Take it again.');
  }
}
