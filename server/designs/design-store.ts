import { randomBytes } from 'node:crypto';
import { mkdir, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';

/** A stored design's file name: 32 random hex characters and its type. Nothing a person typed. */
export const DESIGN_FILE_PATTERN = /^[a-f0-9]{32}\.(svg|png)$/;

/** The designs folder under the hub's uploads folder. */
export const designsDir = (uploadsDir: string) => path.join(uploadsDir, 'designs');

/** Design files on disk, under one folder, with random names. */
export class DesignStore {
  constructor(private readonly dir: string) {}

  /** Writes the bytes under a fresh random name and answers the name. */
  async save(bytes: Uint8Array, ext: 'svg' | 'png'): Promise<string> {
    await mkdir(this.dir, { recursive: true });
    const file = `${randomBytes(16).toString('hex')}.${ext}`;
    await writeFile(path.join(this.dir, file), bytes, { flag: 'wx' });
    return file;
  }

  /** The absolute path of a stored design, or null when the name is not one of ours or the file is gone. */
  async pathOf(file: string): Promise<string | null> {
    if (!DESIGN_FILE_PATTERN.test(file)) return null;
    const full = path.join(this.dir, file);
    const found = await stat(full).catch(() => null);
    return found?.isFile() ? full : null;
  }
}
