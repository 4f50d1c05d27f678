import compression from 'compression';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { existsSync } from 'node:fs';
import { join } from 'node:path';

/** Hashed build output (`/assets/name-hash.js`): its name changes with its content, so it is cached for a year. */
export const IMMUTABLE = 'public, max-age=31536000, immutable';
/** Everything else the app serves (the page, the icon): asked again each time, answered 304 when unchanged. */
export const REVALIDATE = 'no-cache';

/**
 * Compresses the API's answers (JSON, CSV, HTML) by brotli or gzip, as the client accepts. Answers
 * that already carry a Content-Encoding (the precompressed files below) and small ones pass as they are.
 */
export function compressAnswers(): RequestHandler {
  return compression({ threshold: 1024 });
}

/**
 * The built web app: files from `webDistDir` with their brotli (`.br`) or gzip (`.gz`) copies made
 * at build time when the browser accepts them (Content-Encoding and Vary: Accept-Encoding), hashed
 * assets cached as immutable, and `index.html` for every other GET or HEAD outside `/api` (the
 * app's own routes), never cached. Source maps are built but not served in production. Returns no
 * handlers when the app is not built.
 */
export function serveWebApp(webDistDir: string, options: { production: boolean }): RequestHandler[] {
  const indexHtml = join(webDistDir, 'index.html');
  if (!existsSync(indexHtml)) return [];
  const isPageRequest = (request: Request) => (request.method === 'GET' || request.method === 'HEAD') && !request.path.startsWith('/api');

  const hideSourceMaps: RequestHandler = (request, response, next) => {
    if (options.production && isPageRequest(request) && request.path.endsWith('.map')) {
      response.status(404).json({ statusCode: 404, error: 'Not Found', message: 'Source maps are not served in production.' });
      return;
    }
    next();
  };

  const files = expressStaticGzip(webDistDir, {
    enableBrotli: true,
    orderPreference: ['br', 'gz'],
    index: false,
    serveStatic: {
      index: false,
      setHeaders: (response, path) => {
        response.setHeader('Cache-Control', path.startsWith(join(webDistDir, 'assets')) ? IMMUTABLE : REVALIDATE);
      },
    },
  }) as RequestHandler;

  // A missing hashed file (a stale chunk after a redeploy) is a 404, never the page in its place:
  // the app sees the failed import and reloads itself once.
  const missingAsset: RequestHandler = (request, response, next) => {
    if (isPageRequest(request) && request.path.startsWith('/assets/')) {
      response.status(404).json({ statusCode: 404, error: 'Not Found', message: `No file ${request.path}: the app was probably updated; reload the page.` });
      return;
    }
    next();
  };

  // Client-side routes: the app's page, for HEAD as for GET.
  const page = (request: Request, response: Response, next: NextFunction) => {
    if (!isPageRequest(request)) return next();
    response.setHeader('Cache-Control', REVALIDATE);
    response.sendFile(indexHtml);
  };

  return [hideSourceMaps, files, missingAsset, page];
}
