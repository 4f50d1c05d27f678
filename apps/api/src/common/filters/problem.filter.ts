import { ArgumentsHost, Catch, HttpException, HttpStatus, Logger, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { ConnectionError, DatabaseError, OptimisticLockError, UniqueConstraintError, ValidationError as SequelizeValidationError } from 'sequelize';
import type { ProblemBody } from '@friable/contracts';
import { fieldWords, inPeoplesWords } from '../input/field-words';

const reasonPhrases: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  410: 'Gone',
  413: 'Payload Too Large',
  422: 'Unprocessable Entity',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
  503: 'Service Unavailable',
};

function problem(statusCode: number, message: string, extra: Partial<ProblemBody> = {}): ProblemBody {
  return { statusCode, error: reasonPhrases[statusCode] ?? 'Error', message, ...extra };
}

/** Seconds a client is asked to wait (Retry-After) when the database cannot be reached. */
export const RETRY_AFTER_SECONDS = 5;

/** The answer while the database cannot be reached. */
export const databaseUnavailable = (): ProblemBody =>
  problem(503, 'The database cannot be reached just now, so nothing was read or saved. Please try again in a few seconds.');

/**
 * Whether an error means the database is out of reach: no connection could be made or had in
 * time (Sequelize's ConnectionError family, the pool's acquire timeout among them), or the
 * connection broke mid-query (the driver marks such errors fatal; SQLSTATE class 08).
 */
export function isDatabaseUnavailable(exception: unknown): boolean {
  if (exception instanceof ConnectionError) return true;
  if (!(exception instanceof DatabaseError)) return false;
  const cause = exception.parent as { fatal?: boolean; sqlState?: string } | undefined;
  return cause?.fatal === true || (typeof cause?.sqlState === 'string' && cause.sqlState.startsWith('08'));
}

/** Turns every error into a plain answer: no stack trace, SQL text or internal path reaches a client. */
export function toProblem(exception: unknown): ProblemBody {
  if (exception instanceof HttpException) {
    const status = exception.getStatus();
    const body = exception.getResponse();
    if (typeof body === 'string') return problem(status, body);
    const { message, errors } = body as { message?: unknown; errors?: ProblemBody['errors'] };
    const text = Array.isArray(message) ? message.join('; ') : typeof message === 'string' ? message : exception.message;
    // Every refusal names fields as people see them, whichever part of the API wrote it.
    return problem(status, inPeoplesWords(text), errors ? { errors: errors.map((e) => ({ ...e, message: inPeoplesWords(e.message) })) } : {});
  }
  if (exception instanceof UniqueConstraintError) {
    const fields = Object.keys(exception.fields ?? {}).filter((f) => !/^(PRIMARY|.*_unique.*)$/.test(f));
    const field = fields[0];
    return problem(409, field ? `Another record already uses this ${fieldWords(field)}.` : 'That record already exists.', {
      errors: field ? [{ field, message: `${fieldWords(field)} is already taken` }] : undefined,
    });
  }
  if (exception instanceof OptimisticLockError) {
    return problem(409, 'Not saved: this record was changed by someone else at the same moment. Reload it and save again.');
  }
  if (exception instanceof SequelizeValidationError) {
    return problem(422, 'Please correct the highlighted fields.', {
      errors: exception.errors.map((e) => ({ field: e.path ?? undefined, message: inPeoplesWords(e.message) })),
    });
  }
  if (isDatabaseUnavailable(exception)) return databaseUnavailable();
  const type = (exception as { type?: string } | null)?.type;
  if (type === 'entity.parse.failed') return problem(400, 'The request body is not valid JSON.');
  if (type === 'entity.too.large') return problem(413, 'The request body is too large.');
  return problem(500, 'Something went wrong on the server. The error was logged; please try again.');
}

@Catch()
export class ProblemFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = toProblem(exception);
    if (body.statusCode >= HttpStatus.INTERNAL_SERVER_ERROR) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    }
    if (response.headersSent) return;
    if (body.statusCode === HttpStatus.SERVICE_UNAVAILABLE) response.setHeader('Retry-After', String(RETRY_AFTER_SECONDS));
    if (body.statusCode === HttpStatus.TOO_MANY_REQUESTS) {
      // Every 429 says when to come back: the lockout's own time, the throttler's, or a minute.
      const own = (exception as { retryAfterSeconds?: unknown }).retryAfterSeconds;
      if (typeof own === 'number') response.setHeader('Retry-After', String(own));
      else if (!response.getHeader('Retry-After')) response.setHeader('Retry-After', '60');
    }
    response.status(body.statusCode).json(body);
  }
}
