import { registerAs } from '@nestjs/config';
import { parseHosts, type DatabaseHost } from '../database/database-hosts';
import { requireInteger, requireText } from './validate-environment';

export interface DatabaseConfig {
  /** The first of `hosts` (the one a single server setup has). */
  host: string;
  port: number;
  /** DB_HOST: one server, or the nodes of a Galera cluster in order of preference (host[:port], comma-separated). */
  hosts: DatabaseHost[];
  /** DB_READ_HOSTS: replicas that take reads outside transactions (empty: every query goes to `hosts`). */
  readHosts: DatabaseHost[];
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
  const port = requireInteger(env, 'DB_PORT', 3407, 1, 65535);
  const hosts = parseHosts('DB_HOST', requireText(env, 'DB_HOST', '127.0.0.1'), port);
  const readHosts = env.DB_READ_HOSTS?.trim() ? parseHosts('DB_READ_HOSTS', env.DB_READ_HOSTS, port) : [];
  return {
    host: hosts[0]!.host,
    port: hosts[0]!.port,
    hosts,
    readHosts,
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
