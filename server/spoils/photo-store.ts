import { randomBytes } from 'node:crypto';
import { mkdir, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';

/** A stored photo's file name: 32 random hex characters, "-thumb" for a thumbnail, and its type. */
export const PHOTO_FILE_PATTERN = /^[a-f0-9]{32}(-thumb)?\.(jpg|png|webp)$/;

/** The photos folder under the hub's uploads folder. */
export const photosDir = (uploadsDir: string) => path.join(uploadsDir, 'photos');

/** Spoil photos and their thumbnails on disk, under one folder, with random names. */
export class PhotoStore {
  constructor(private readonly dir: string) {}

  /** Writes a photo and its thumbnail under one fresh random name and answers both names. */
  async save(photo: Uint8Array, ext: 'jpg' | 'png' | 'webp', thumb: Uint8Array): Promise<{ file: string; thumbFile: string }> {
    await mkdir(this.dir, { recursive: true });
    const name = randomBytes(16).toString('hex');
    const file = `${name}.${ext}`;
    const thumbFile = `${name}-thumb.jpg`;
    await writeFile(path.join(this.dir, file), photo, { flag: 'wx' });
    await writeFile(path.join(this.dir, thumbFile), thumb, { flag: 'wx' });
    return { file, thumbFile };
  }

  /** Removes files that lost a race to another upload of the same photo. */
  async remove(...files: string[]): Promise<void> {
    await Promise.all(files.filter((file) => PHOTO_FILE_PATTERN.test(file)).map((file) => rm(path.join(this.dir, file), { force: true })));
  }

  /** The absolute path of a stored file, or null when the name is not one of ours or the file is gone. */
  async pathOf(file: string): Promise<string | null> {
    if (!PHOTO_FILE_PATTERN.test(file)) return null;
    const full = path.join(this.dir, file);
    const found = await stat(full).catch(() => null);
    return found?.isFile() ? full : null;
  }
}
