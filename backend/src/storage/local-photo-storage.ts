import { randomUUID } from 'node:crypto';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, join, normalize, sep } from 'node:path';
import { PhotoStorage } from './photo-storage';

/** Photos in a local folder; keys are relative paths made by the app (never by users). */
export class LocalPhotoStorage extends PhotoStorage {
  constructor(private readonly root: string) {
    super();
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    const path = this.pathOf(key);
    await mkdir(dirname(path), { recursive: true });
    // Write then rename, so a reader never sees half a file (and two writers never share one).
    const partial = `${path}.${randomUUID()}.partial`;
    await writeFile(partial, bytes);
    await rename(partial, path);
  }

  async get(key: string): Promise<Buffer | undefined> {
    try {
      return await readFile(this.pathOf(key));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
      throw error;
    }
  }

  async remove(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }

  private pathOf(key: string): string {
    const path = normalize(join(this.root, key));
    if (!path.startsWith(normalize(this.root) + sep)) throw new Error(`storage key escapes the store: ${key}`);
    return path;
  }
}
