import { registerAs } from '@nestjs/config';
import { resolve } from 'node:path';
import { requireText } from '../config/validate-environment';

export interface StorageConfig {
  /** Absolute folder of the local-disk store (STORAGE_DIR, relative to the repository root). */
  dir: string;
}

// The repository root, from src/storage or dist/storage alike.
const repoRoot = resolve(__dirname, '../../../..');

export function readStorageConfig(env: NodeJS.ProcessEnv = process.env): StorageConfig {
  return { dir: resolve(repoRoot, requireText(env, 'STORAGE_DIR', '.data/storage')) };
}

export const storageConfig = registerAs('storage', () => readStorageConfig());
