import { Inject, Injectable } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, resolve, sep } from 'node:path';
import { storageConfig } from './storage.config';

/** Keys are relative paths of letters, digits, dots, hyphens and underscores, e.g. `photos/12/345-7.jpg`. */
const keyPattern = /^(?:[A-Za-z0-9_-][A-Za-z0-9._-]*\/)*[A-Za-z0-9_-][A-Za-z0-9._-]*$/;

/**
 * Storage service — keeps uploaded files (plot photos) by key, on the local disk under STORAGE_DIR.
 *
 * Purpose: the one place bytes are written, so another backend (an object store) can replace it
 * without touching the features. Writes go to a temporary file first and are renamed into place,
 * so a reader never sees half a file.
 * Throws: RangeError for a key that is not a plain relative path; the file system's errors otherwise.
 * Example: `await storage.put('photos/1/2-3.jpg', bytes)`; `await storage.get('photos/1/2-3.jpg')` → the bytes, or null.
 */
@Injectable()
export class StorageService {
  constructor(@Inject(storageConfig.KEY) private readonly config: ConfigType<typeof storageConfig>) {}

  private pathOf(key: string): string {
    if (!keyPattern.test(key) || key.split('/').some((part) => part === '..' || part === '.')) {
      throw new RangeError(`storage key must be a relative path of plain names (got "${key}")`);
    }
    const path = resolve(this.config.dir, key);
    if (!path.startsWith(this.config.dir + sep)) throw new RangeError(`storage key must stay inside the store (got "${key}")`);
    return path;
  }

  async put(key: string, bytes: Buffer): Promise<void> {
    const path = this.pathOf(key);
    await mkdir(dirname(path), { recursive: true });
    const temporary = `${path}.${process.pid}.${Date.now()}.part`;
    await writeFile(temporary, bytes);
    await rename(temporary, path);
  }

  /** The stored bytes, or null when nothing is stored under the key. */
  async get(key: string): Promise<Buffer | null> {
    try {
      return await readFile(this.pathOf(key));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    await rm(this.pathOf(key), { force: true });
  }
}
