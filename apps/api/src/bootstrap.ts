import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { SwaggerModule } from '@nestjs/swagger';
import express, { type NextFunction, type Request, type Response } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AppModule } from './app.module';
import { toProblem } from './common/filters/problem.filter';
import { createValidationPipe } from './common/pipes/validation.pipe';
import { readAppConfig } from './config/app.config';
import { createOpenApiDocument } from './openapi/openapi-document';

/** Everything main.ts and the end-to-end tests share: prefix, validation, OpenAPI page, the built web app. */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.set('trust proxy', 'loopback');
  app.disable('x-powered-by');
  // Analysis requests carry whole data sets; everything else stays small.
  app.use('/api/stats', express.json({ limit: '25mb' }));
  app.use(express.json({ limit: '2mb' }));
  // Body-parser failures are answered here, in the API's own words, before they reach a route.
  app.use((error: unknown, _request: Request, response: Response, next: NextFunction) => {
    if (!error) return next();
    const body = toProblem(error);
    response.status(body.statusCode).json(body);
  });
  app.enableShutdownHooks();

  const document = createOpenApiDocument(app);
  SwaggerModule.setup('api/docs', app, document, { jsonDocumentUrl: 'api/docs/openapi.json' });

  const { webDistDir } = readAppConfig();
  const indexHtml = join(webDistDir, 'index.html');
  if (existsSync(indexHtml)) {
    app.use(express.static(webDistDir, { index: false, maxAge: '1h' }));
    // Client-side routes: any GET outside /api gets the app's page.
    app.use((request: Request, response: Response, next: NextFunction) => {
      if (request.method !== 'GET' || request.path.startsWith('/api')) return next();
      response.setHeader('Cache-Control', 'no-cache');
      response.sendFile(indexHtml);
    });
  }
  return app;
}

export async function createApp(): Promise<NestExpressApplication> {
  // Warnings and errors only: the route table at every start is noise for the people running it.
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { logger: ['warn', 'error'], bodyParser: false });
  return configureApp(app);
}
