import { registerAs } from '@nestjs/config';
import { requireInteger } from '../config/validate-environment';

export interface PhotosConfig {
  /** Largest photo accepted (PHOTO_MAX_BYTES, default 8 MB: a phone's full-size JPEG). */
  maxBytes: number;
}

export function readPhotosConfig(env: NodeJS.ProcessEnv = process.env): PhotosConfig {
  return { maxBytes: requireInteger(env, 'PHOTO_MAX_BYTES', 8 * 1_048_576, 1024, 100 * 1_048_576) };
}

export const photosConfig = registerAs('photos', () => readPhotosConfig());
