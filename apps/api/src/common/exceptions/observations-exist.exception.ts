import { ConflictException } from '@nestjs/common';

/** An edit that would change the meaning of stored observations, refused. */
export class ObservationsExistException extends ConflictException {
  constructor(what: string, siteNames: string[]) {
    super(`${what} is refused: ${siteNames.join(', ')} already ${siteNames.length === 1 ? 'has' : 'have'} observations, whose meaning it would change.`);
  }
}
