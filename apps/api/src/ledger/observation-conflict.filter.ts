import type { ObservationConflict } from '@friable/contracts';
import { Catch, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { ObservationConflictException } from './observation-conflict.exception';

/** Answers an ObservationConflictException with the stored value beside the message (the global filter keeps only message and errors). */
@Catch(ObservationConflictException)
export class ObservationConflictFilter implements ExceptionFilter {
  catch(exception: ObservationConflictException, host: ArgumentsHost): void {
    const body: ObservationConflict = { statusCode: 409, error: 'Conflict', message: exception.message, current: exception.current };
    host.switchToHttp().getResponse<Response>().status(409).json(body);
  }
}
