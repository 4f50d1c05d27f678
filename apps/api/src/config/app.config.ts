import { registerAs } from '@nestjs/config';
import { resolve } from 'node:path';
import { requireFlag, requireInteger, requireText } from './validate-environment';

export interface AppConfig {
  host: string;
  port: number;
  appUrl: string;
  webDistDir: string;
  nodeEnv: string;
  /** API_DOCS_PUBLIC: serve the OpenAPI page and document at /api/docs to anyone (off unless set). */
  apiDocsPublic: boolean;
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
    apiDocsPublic: requireFlag(env, 'API_DOCS_PUBLIC', false),
  };
}

export const appConfig = registerAs('app', () => readAppConfig());
