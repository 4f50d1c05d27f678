import type { RequestHandler } from 'express';
import { databaseUnavailable, RETRY_AFTER_SECONDS } from '../common/filters/problem.filter';
import type { DatabaseWatchService } from './database-watch.service';

/**
 * While the database watch says the database does not answer, every API request but the health
 * check is answered at once with 503 and Retry-After, instead of waiting on a connection.
 */
export function databaseGate(watch: DatabaseWatchService): RequestHandler {
  return (request, response, next) => {
    if (watch.isUp || !request.path.startsWith('/api/') || request.path === '/api/health') return next();
    response.setHeader('Retry-After', String(RETRY_AFTER_SECONDS));
    response.status(503).json(databaseUnavailable());
  };
}
