import * as mariadb from 'mariadb';
import type { SequelizeOptions } from 'sequelize-typescript';
import type { DatabaseConfig } from '../config/database.config';
import { openLocalInfile } from './local-infile';

/** Connection options shared by the Nest module, the command line and the tests. */
export function sequelizeOptions(config: DatabaseConfig): SequelizeOptions {
  return {
    dialect: 'mariadb',
    // Handed over explicitly so Sequelize uses the driver version this package pins.
    dialectModule: mariadb,
    host: config.host,
    port: config.port,
    database: config.database,
    username: config.username,
    password: config.password,
    logging: false,
    pool: { max: config.poolMax, min: 0, idle: 10_000 },
    define: { underscored: true, timestamps: true },
    // LOAD DATA LOCAL INFILE (Intake's bulk load) reads only streams this process registered; see local-infile.ts.
    dialectOptions: { connectTimeout: 5_000, permitLocalInfile: true, infileStreamFactory: openLocalInfile },
    timezone: '+00:00',
  };
}
