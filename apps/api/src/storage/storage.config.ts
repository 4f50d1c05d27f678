import { registerAs } from '@nestjs/config';
import { resolve } from 'node:path';
import { EnvironmentError, requireFlag, requireText } from '../config/validate-environment';

export interface ObjectStoreConfig {
  /** S3_ENDPOINT: the S3-compatible service (empty: the provider's default for the region). */
  endpoint: string | null;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  /** S3_FORCE_PATH_STYLE: bucket in the path (s3rver, most self-hosted stores) rather than the host name. */
  forcePathStyle: boolean;
}

export interface StorageConfig {
  /** STORAGE_BACKEND: s3 (object storage, shared by every API instance) or disk (one machine only). */
  backend: 's3' | 'disk';
  /** Absolute folder of the local-disk store (STORAGE_DIR, relative to the repository root). */
  dir: string;
  s3: ObjectStoreConfig;
}

// The repository root, from src/storage or dist/storage alike.
const repoRoot = resolve(__dirname, '../../../..');

export function readStorageConfig(env: NodeJS.ProcessEnv = process.env): StorageConfig {
  const backend = requireText(env, 'STORAGE_BACKEND', 's3');
  if (backend !== 's3' && backend !== 'disk') throw new EnvironmentError(`STORAGE_BACKEND must be s3 or disk (got "${backend}").`);
  const endpoint = env.S3_ENDPOINT?.trim() ?? '';
  if (endpoint && !/^https?:\/\/[^/\s]+\/?$/.test(endpoint)) throw new EnvironmentError(`S3_ENDPOINT must be an http(s) address such as http://127.0.0.1:5102 (got "${endpoint}").`);
  return {
    backend,
    dir: resolve(repoRoot, requireText(env, 'STORAGE_DIR', '.data/storage')),
    s3: {
      endpoint: endpoint || null,
      region: requireText(env, 'S3_REGION', 'us-east-1'),
      bucket: requireText(env, 'S3_BUCKET', 'friable'),
      accessKeyId: requireText(env, 'S3_ACCESS_KEY_ID', 'S3RVER'),
      secretAccessKey: requireText(env, 'S3_SECRET_ACCESS_KEY', 'S3RVER'),
      forcePathStyle: requireFlag(env, 'S3_FORCE_PATH_STYLE', true),
    },
  };
}

export const storageConfig = registerAs('storage', () => readStorageConfig());
