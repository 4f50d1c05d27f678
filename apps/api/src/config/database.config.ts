import { registerAs } from '@nestjs/config';
import { requireInteger, requireText } from './validate-environment';

export interface DatabaseConfig {
  host: string;
  port: number;
  database: string;
  username: string;
  password: string;
  poolMax: number;
}

export function readDatabaseConfig(env: NodeJS.ProcessEnv = process.env): DatabaseConfig {
  return {
    host: requireText(env, 'DB_HOST', '127.0.0.1'),
    port: requireInteger(env, 'DB_PORT', 3407, 1, 65535),
    database: requireText(env, 'DB_NAME'),
    username: requireText(env, 'DB_USER'),
    password: requireText(env, 'DB_PASSWORD'),
    poolMax: requireInteger(env, 'DB_POOL_MAX', 10, 1, 200),
  };
}

export const databaseConfig = registerAs('database', () => readDatabaseConfig());
