import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations';

/** Umzug over Sequelize's query interface, with the applied migrations recorded in `schema_migrations`. */
export function createMigrator(sequelize: Sequelize, logger: Pick<Console, 'info' | 'warn' | 'error'> | undefined = console) {
  return new Umzug<QueryInterface>({
    migrations: migrations.map(([name, module]) => ({
      name,
      up: (params) => module.up(params),
      down: (params) => module.down(params),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: logger && { info: (m) => logger.info(m), warn: (m) => logger.warn(m), error: (m) => logger.error(m), debug: () => undefined },
  });
}
