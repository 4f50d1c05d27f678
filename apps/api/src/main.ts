import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { createApp } from './bootstrap';
import { readAppConfig } from './config/app.config';

async function main(): Promise<void> {
  const config = readAppConfig();
  const app = await createApp();
  await app.listen(config.port, config.host);
  new Logger('Friable').log(`listening on http://${config.host}:${config.port} (OpenAPI page at /api/docs)`);
}

main().catch((error: unknown) => {
  process.stderr.write(`Friable API could not start: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
