import { Inject, Injectable, type OnApplicationShutdown } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { mkdir, readFile, rename, rm, writeFile } from 'node:fs/promises';
import { dirname, resolve, sep } from 'node:path';
import { ObjectStore } from './object-store';
import { storageConfig } from './storage.config';

/** Keys are relative paths of letters, digits, dots, hyphens and underscores, e.g. `photos/12/345-7.jpg`. */
const keyPattern = /^(?:[A-Za-z0-9_-][A-Za-z0-9._-]*\/)*[A-Za-z0-9_-][A-Za-z0-9._-]*$/;

const contentTypes: Record<string, string> = { jpg: 'image/jpeg', jpeg: 'image/jpeg', png: 'image/png' };

/**
 * Storage service — keeps uploaded files (plot photos) by key: in S3-compatible object storage
 * (STORAGE_BACKEND=s3, the default: every API instance sees the same files; s3rver stands in locally), or on
 * the local disk under STORAGE_DIR (STORAGE_BACKEND=disk, one machine only).
 *
 * Purpose: the one place bytes are written, so the features never know the backend. On disk, writes go to
 * a temporary file first and are renamed into place; an object PUT is atomic by itself. Either way a reader
 * never sees half a file.
 * Throws: RangeError for a key that is not a plain relative path; the file system's errors otherwise.
 * Example: `await storage.put('photos/1/2-3.jpg', bytes)`; `await storage.get('photos/1/2-3.jpg')` → the bytes, or null.
 */
@Injectable()
export class StorageService implements OnApplicationShutdown {
  private readonly objects: ObjectStore | null;

  constructor(@Inject(storageConfig.KEY) private readonly config: ConfigType<typeof storageConfig>) {
    this.objects = config.backend === 's3' ? new ObjectStore(config.s3) : null;
  }

  onApplicationShutdown(): void {
    this.objects?.close();
  }

  /** The key itself once it is a plain relative path (the same rule for both backends). */
  private checked(key: string): string {
    this.pathOf(key);
    return key;
  }

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
    if (this.objects) return this.objects.put(key, bytes, contentTypes[key.split('.').pop()!.toLowerCase()] ?? 'application/octet-stream');
    await mkdir(dirname(path), { recursive: true });
    const temporary = `${path}.${process.pid}.${Date.now()}.part`;
    await writeFile(temporary, bytes);
    await rename(temporary, path);
  }

  /** The stored bytes, or null when nothing is stored under the key. */
  async get(key: string): Promise<Buffer | null> {
    if (this.objects) return this.objects.get(this.checked(key));
    try {
      return await readFile(this.pathOf(key));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return null;
      throw error;
    }
  }

  async delete(key: string): Promise<void> {
    if (this.objects) return this.objects.delete(this.checked(key));
    await rm(this.pathOf(key), { force: true });
  }
}
