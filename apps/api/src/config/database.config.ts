import { registerAs } from '@nestjs/config';
import { requireInteger, requireText } from './validate-environment';

export interface DatabaseConfig {
  host: string;
  port: number;
  database: string;
  username: string;
  password: string;
  poolMax: number;
  /** Longest wait for a pooled connection before the request is answered 503 (DB_ACQUIRE_TIMEOUT_MS). */
  acquireTimeoutMs: number;
  /** Longest wait for a new connection's handshake (DB_CONNECT_TIMEOUT_MS). */
  connectTimeoutMs: number;
  /** Longest silence on a connection in use before it is given up (DB_SOCKET_TIMEOUT_MS): bounds a query sent to a frozen server. */
  socketTimeoutMs: number;
}

export function readDatabaseConfig(env: NodeJS.ProcessEnv = process.env): DatabaseConfig {
  return {
    host: requireText(env, 'DB_HOST', '127.0.0.1'),
    port: requireInteger(env, 'DB_PORT', 3407, 1, 65535),
    database: requireText(env, 'DB_NAME'),
    username: requireText(env, 'DB_USER'),
    password: requireText(env, 'DB_PASSWORD'),
    poolMax: requireInteger(env, 'DB_POOL_MAX', 10, 1, 200),
    acquireTimeoutMs: requireInteger(env, 'DB_ACQUIRE_TIMEOUT_MS', 1_000, 100, 600_000),
    connectTimeoutMs: requireInteger(env, 'DB_CONNECT_TIMEOUT_MS', 1_000, 100, 600_000),
    socketTimeoutMs: requireInteger(env, 'DB_SOCKET_TIMEOUT_MS', 60_000, 1_000, 3_600_000),
  };
}

export const databaseConfig = registerAs('database', () => readDatabaseConfig());
