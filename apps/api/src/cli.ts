import 'reflect-metadata';
import { Sequelize } from 'sequelize-typescript';
import { readDatabaseConfig } from './config/database.config';
import { allModels } from './database/models';
import { createMigrator } from './database/migrator';
import { sequelizeOptions } from './database/sequelize-options';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { DemoLoaderService } from './demo/demo-loader.service';

const usage = `usage: node dist/cli.js migrate up|down|down-all|status
       node dist/cli.js demo load`;

async function main(args: string[]): Promise<void> {
  // Migrations may run one long statement (an index on a big table): no socket timeout here.
  const sequelize = new Sequelize({ ...sequelizeOptions({ ...readDatabaseConfig(), socketTimeoutMs: 0 }), models: allModels });
  try {
    const [area, action] = args;
    if (area === 'migrate') {
      const migrator = createMigrator(sequelize, { info: () => undefined, warn: console.warn, error: console.error });
      if (action === 'up') {
        const done = await migrator.up();
        console.log(done.length ? `applied ${done.length} migration(s): ${done.map((m) => m.name).join(', ')}` : 'schema is up to date');
      } else if (action === 'down') {
        const done = await migrator.down();
        console.log(`reverted ${done.map((m) => m.name).join(', ') || 'nothing'}`);
      } else if (action === 'down-all') {
        const done = await migrator.down({ to: 0 });
        console.log(`reverted ${done.length} migration(s)`);
      } else if (action === 'status') {
        const pending = await migrator.pending();
        const executed = await migrator.executed();
        console.log(`executed: ${executed.length}, pending: ${pending.map((m) => m.name).join(', ') || 'none'}`);
      } else {
        throw new Error(usage);
      }
    } else if (area === 'demo' && action === 'load') {
      // Through the API's own services, so the demo passes the same checks and fills the activity log.
      const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error', 'warn'] });
      try {
        const { created, protocols } = await app.get(DemoLoaderService).load(process.env.DEMO_PASSWORD || 'friable-demo');
        console.log(
          created || protocols.length
            ? `demo scenario loaded (${created} new records; protocols: ${protocols.join(', ') || 'none'})`
            : 'demo scenario already loaded',
        );
      } finally {
        await app.close();
      }
    } else {
      throw new Error(usage);
    }
  } finally {
    await sequelize.close();
  }
}

main(process.argv.slice(2)).catch((error: unknown) => {
  process.stderr.write(`${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
