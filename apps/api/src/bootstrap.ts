import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import express, { type NextFunction, type Request, type Response } from 'express';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AppModule } from './app.module';
import { toProblem } from './common/filters/problem.filter';
import { createValidationPipe } from './common/pipes/validation.pipe';
import { readAppConfig } from './config/app.config';
import { readAuthConfig } from './config/auth.config';

/** Everything main.ts and the end-to-end tests share: prefix, validation, OpenAPI page, the built web app. */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  // X-Forwarded-For counts only from the proxies TRUST_PROXY names (none by default), so a client cannot
  // choose the address that sign-in lockouts and rate limits count by.
  app.set('trust proxy', readAuthConfig().trustProxy);
  app.use(cookieParser());
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

  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Friable API')
      .setDescription('Replicated garden-treatment trials: protocol, sites, plots, observations and findings.')
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
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
