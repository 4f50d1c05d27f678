import * as mariadb from 'mariadb';
import type { SequelizeOptions } from 'sequelize-typescript';
import type { DatabaseConfig } from '../config/database.config';
import { hostRing } from './database-hosts';
import { openLocalInfile } from './local-infile';

/** Connection options shared by the Nest module, the command line and the tests (a socket timeout of 0 means none). */
export function sequelizeOptions(config: DatabaseConfig): SequelizeOptions {
  const ring = hostRing(config.hosts);
  const credentials = { database: config.database, username: config.username, password: config.password };
  return {
    ...(config.readHosts.length
      ? { replication: { write: { host: config.host, port: String(config.port), ...credentials }, read: config.readHosts.map((h) => ({ host: h.host, port: String(h.port), ...credentials })) } }
      : {}),
    // Several nodes in DB_HOST: each new connection goes to the node in use (the watch moves it on when one stops answering).
    hooks: {
      beforeConnect: (connection: { host?: string; port?: number | string }) => {
        if (config.hosts.length < 2 || !ring.isWriteHost(connection.host, Number(connection.port))) return;
        connection.host = ring.current.host;
        connection.port = ring.current.port;
      },
    },
    dialect: 'mariadb',
    // Handed over explicitly so Sequelize uses the driver version this package pins.
    dialectModule: mariadb,
    host: config.host,
    port: config.port,
    database: config.database,
    username: config.username,
    password: config.password,
    logging: false,
    // Short waits, so that a database that is gone is answered 503 within a second (see
    // common/filters/problem.filter.ts) rather than holding requests; the socket timeout bounds a
    // query sent to a server that froze (a paused server never closes the connection).
    pool: { max: config.poolMax, min: 0, idle: 10_000, acquire: config.acquireTimeoutMs, evict: 1_000 },
    define: { underscored: true, timestamps: true },
    // LOAD DATA LOCAL INFILE (Intake's bulk load) reads only streams this process registered; see local-infile.ts.
    dialectOptions: {
      connectTimeout: config.connectTimeoutMs,
      socketTimeout: config.socketTimeoutMs,
      permitLocalInfile: true,
      infileStreamFactory: openLocalInfile,
    },
    timezone: '+00:00',
  };
}
