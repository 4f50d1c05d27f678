import { registerAs } from '@nestjs/config';
import { resolve } from 'node:path';
import { requireInteger, requireText } from './validate-environment';

export interface AppConfig {
  host: string;
  port: number;
  appUrl: string;
  webDistDir: string;
  nodeEnv: string;
}

export function readAppConfig(env: NodeJS.ProcessEnv = process.env): AppConfig {
  const host = requireText(env, 'HOST', '127.0.0.1');
  const port = requireInteger(env, 'PORT', 3000, 1, 65535);
  return {
    host,
    port,
    appUrl: requireText(env, 'APP_URL', `http://${host}:${port}`).replace(/\/$/, ''),
    webDistDir: resolve(requireText(env, 'WEB_DIST_DIR', resolve(__dirname, '../../../web/dist'))),
    nodeEnv: requireText(env, 'NODE_ENV', 'development'),
  };
}

export const appConfig = registerAs('app', () => readAppConfig());
