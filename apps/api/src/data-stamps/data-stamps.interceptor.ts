import { Injectable, type CallHandler, type ExecutionContext, type NestInterceptor } from '@nestjs/common';
import type { Request } from 'express';
import { catchError, from, mergeMap, type Observable } from 'rxjs';
import { toProblem } from '../common/filters/problem.filter';
import { ALL_SCOPE, DataStampsService, trialScope } from './data-stamps.service';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
// Sign-in and the stateless analysis endpoints write no trial data.
const WRITES_NO_DATA = /^\/api\/(auth|stats)(\/|$)/;

/** The scope a request writes: its trial when the route names one, else everything. Null for reads. */
export function writtenScope(method: string, path: string, trialIdParam: unknown): string | null {
  if (SAFE_METHODS.has(method.toUpperCase()) || WRITES_NO_DATA.test(path)) return null;
  const trialId = Number(trialIdParam);
  return Number.isInteger(trialId) && trialId > 0 ? trialScope(trialId) : ALL_SCOPE;
}

/**
 * Data stamp interceptor — after every request that may write (any method but GET, HEAD and OPTIONS),
 * replaces the stamp of the trial it names (or of everything), before the answer goes out, so the writer's next
 * read and every other instance's see fresh answers. A refusal (4xx) wrote nothing and is not stamped; a failure
 * (5xx, or no answer at all) is, since whether anything was written is not known there.
 */
@Injectable()
export class DataStampsInterceptor implements NestInterceptor {
  constructor(private readonly stamps: DataStampsService) {}

  intercept(context: ExecutionContext, next: CallHandler): Observable<unknown> {
    if (context.getType() !== 'http') return next.handle();
    const request = context.switchToHttp().getRequest<Request>();
    const scope = writtenScope(request.method, request.path, request.params?.trialId);
    if (scope === null) return next.handle();
    return next.handle().pipe(
      mergeMap((value) => from(this.stamps.touch(scope).then(() => value))),
      catchError((error: unknown) => {
        // Answered as the problem filter will answer it: a 4xx is a refusal.
        if (toProblem(error).statusCode < 500) throw error;
        return from(this.stamps.touch(scope).then(() => Promise.reject(error)));
      }),
    );
  }
}
