import 'reflect-metadata';
import { createApp } from './bootstrap';
import { readAppConfig } from './config/app.config';

async function main(): Promise<void> {
  const config = readAppConfig();
  const app = await createApp();
  await app.listen(config.port, config.host);
  const docs = config.apiDocsPublic ? ' (OpenAPI page at /api/docs)' : '';
  process.stdout.write(`Friable API listening on http://${config.host}:${config.port}${docs}\n`);
}

main().catch((error: unknown) => {
  process.stderr.write(`Friable API could not start: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
});
