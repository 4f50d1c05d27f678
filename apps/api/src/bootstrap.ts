import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import type { NextFunction, Request, Response } from 'express';
import { AppModule } from './app.module';
import { toProblem } from './common/filters/problem.filter';
import { boundedJson } from './common/input/bounded-json';
import { createValidationPipe } from './common/pipes/validation.pipe';
import { securityHeaders } from './common/security/security-headers';
import { compressAnswers, serveWebApp } from './common/web/web-app';
import { readAppConfig } from './config/app.config';
import { createOpenApiDocument } from './openapi/openapi-document';
import { readAuthConfig } from './config/auth.config';
import { databaseGate } from './health/database-gate';
import { DatabaseWatchService } from './health/database-watch.service';
import { MAX_OBSERVATIONS } from './stats/dto/anova-request.dto';

/** Everything main.ts and the end-to-end tests share: prefix, validation, OpenAPI page, the built web app. */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix('api');
  app.use(securityHeaders());
  // Answers of 1 kB or more go out compressed (brotli or gzip); the web app's files are compressed at build.
  app.use(compressAnswers());
  // While the database does not answer, API requests are answered 503 at once (health/database-gate.ts).
  app.use(databaseGate(app.get(DatabaseWatchService)));
  app.useGlobalPipes(createValidationPipe());
  // X-Forwarded-For counts only from the proxies TRUST_PROXY names (none by default), so a client cannot
  // choose the address that sign-in lockouts and rate limits count by.
  app.set('trust proxy', readAuthConfig().trustProxy);
  app.use(cookieParser());
  app.disable('x-powered-by');
  // Analysis requests carry whole data sets; everything else stays small. Depth, list length and
  // numbers are bounded on the raw bytes before JSON.parse (common/input/bounded-json.ts).
  app.use('/api/stats', boundedJson({ limit: '25mb', maxItems: MAX_OBSERVATIONS }));
  app.use(boundedJson({ limit: '2mb' }));
  // Body-parser failures are answered here, in the API's own words, before they reach a route.
  app.use((error: unknown, _request: Request, response: Response, next: NextFunction) => {
    if (!error) return next();
    const body = toProblem(error);
    response.status(body.statusCode).json(body);
  });
  app.enableShutdownHooks();

  const { webDistDir, apiDocsPublic, nodeEnv } = readAppConfig();
  // The OpenAPI page is public only when API_DOCS_PUBLIC=true; otherwise it is not served at all.
  if (apiDocsPublic) SwaggerModule.setup('api/docs', app, createOpenApiDocument(app), { jsonDocumentUrl: 'api/docs/openapi.json' });

  // The built web app (common/web/web-app.ts): precompressed files, immutable hashed assets, the page for every app route.
  for (const handler of serveWebApp(webDistDir, { production: nodeEnv === 'production' })) app.use(handler);
  return app;
}

// The OpenAPI document (src/openapi/openapi-document.ts), re-exported for the tests that import it from here.
export { createOpenApiDocument };

export async function createApp(): Promise<NestExpressApplication> {
  // Warnings and errors only: the route table at every start is noise for the people running it.
  const app = await NestFactory.create<NestExpressApplication>(AppModule, { logger: ['warn', 'error'], bodyParser: false });
  return configureApp(app);
}
