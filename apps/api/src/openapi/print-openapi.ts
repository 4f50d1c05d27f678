import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { AppModule } from '../app.module';
import { createOpenApiDocument } from './openapi-document';

/**
 * Writes the OpenAPI document as JSON to standard output without a database: Nest's preview mode
 * builds the module graph and reads the routes' metadata without creating any provider.
 * Used by `npm run api:client` to regenerate the web app's typed client.
 */
export async function readOpenApiDocument(): Promise<string> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { preview: true, logger: false, bodyParser: false });
  app.setGlobalPrefix('api');
  const document = createOpenApiDocument(app);
  await app.close();
  return `${JSON.stringify(document, null, 2)}\n`;
}

if (require.main === module) {
  readOpenApiDocument()
    .then((json) => process.stdout.write(json))
    .catch((error: unknown) => {
      process.stderr.write(`The OpenAPI document could not be built: ${error instanceof Error ? error.message : String(error)}\n`);
      process.exit(1);
    });
}
