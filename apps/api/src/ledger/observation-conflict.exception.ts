import type { Observation } from '@friable/contracts';
import { ConflictException } from '@nestjs/common';

/** An edit from a stale version (or a new value for a cell that has one): nothing written; carries the stored value. */
export class ObservationConflictException extends ConflictException {
  constructor(
    message: string,
    readonly current: Observation,
  ) {
    super(message);
  }
}
