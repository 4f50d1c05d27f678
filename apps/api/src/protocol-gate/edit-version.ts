import type { VersionConflict } from '@friable/contracts';
import { applyDecorators, Catch, ConflictException, UseFilters, type ArgumentsHost, type ExceptionFilter, type Type } from '@nestjs/common';
import { ApiConflictResponse, ApiExtraModels, ApiProperty, getSchemaPath } from '@nestjs/swagger';
import { IsInt, Min } from 'class-validator';
import type { Response } from 'express';
import { ProblemDto } from '../common/dto/problem.dto';

/**
 * Edit versions — how an edit made from an old copy of a record is refused instead of silently overwriting.
 *
 * Every editable record (an observation, a trial and each protocol row) carries `version`, bumped by every save
 * (Sequelize's `version: true` on the protocol models). A PATCH sends the version it was made from; another
 * one answers 409 with the record as it is stored now (`current`), and nothing is written. The write gate
 * locks the trial row first, so two edits of the same trial are checked one after the other.
 */

/** The version part of every PATCH body of an editable record. */
export class EditVersionDto {
  @ApiProperty({ example: 1, description: 'The version the editor saw (from the GET answer); another one answers 409 with the current record.' })
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number, 1 or more' })
  version!: number;
}

/** A stale edit: nothing written; carries the record as it is stored now. */
export class StaleEditException<T = unknown> extends ConflictException {
  constructor(
    message: string,
    readonly current: T,
  ) {
    super(message);
  }
}

/** Answers a StaleEditException with the stored record beside the message (the global filter keeps only message and errors). */
@Catch(StaleEditException)
export class StaleEditFilter implements ExceptionFilter {
  catch(exception: StaleEditException, host: ArgumentsHost): void {
    const body: VersionConflict<unknown> = { statusCode: 409, error: 'Conflict', message: exception.message, current: exception.current };
    host.switchToHttp().getResponse<Response>().status(409).json(body);
  }
}

/**
 * Refuses an edit sent with another version than the stored one; `thing` names the record as people see it
 * ("treatment G40"), `current` presents it.
 */
export async function refuseStaleEdit<T>(thing: string, stored: number, sent: number, current: () => T | Promise<T>): Promise<void> {
  if (stored === sent) return;
  throw new StaleEditException(
    `Not saved: ${thing} was changed by someone else since you opened it (your version ${sent}, now ${stored}). ` +
      'Look at the current values and save again if yours are still right.',
    await current(),
  );
}

/** What an audit entry keeps of an edit: the fields that changed, with their old and new values. */
export function changeDetails<T extends object>(before: T, after: T, fields: ReadonlyArray<keyof T>): { changed: Array<keyof T>; before: Partial<T>; after: Partial<T> } {
  const changed = fields.filter((field) => JSON.stringify(before[field]) !== JSON.stringify(after[field]));
  return {
    changed,
    before: Object.fromEntries(changed.map((field) => [field, before[field]])) as Partial<T>,
    after: Object.fromEntries(changed.map((field) => [field, after[field]])) as Partial<T>,
  };
}

const conflictModels = new Map<string, Type>();

/** The OpenAPI model of a 409 answer carrying a `current` record (or list) of the given answer class, e.g. TreatmentConflict. */
function conflictModel(record: Type | [Type]): Type {
  const one = Array.isArray(record) ? record[0] : record;
  const name = `${one.name.replace(/Dto$/, '')}${Array.isArray(record) ? 'List' : ''}Conflict`;
  const known = conflictModels.get(name);
  if (known) return known;
  class Conflict implements VersionConflict<unknown> {
    @ApiProperty({ enum: [409] })
    statusCode: 409;

    @ApiProperty()
    error: string;

    @ApiProperty()
    message: string;

    @ApiProperty({ type: record, description: 'The record as it is stored now, with its version.' })
    current: unknown;
  }
  Object.defineProperty(Conflict, 'name', { value: name });
  conflictModels.set(name, Conflict);
  return Conflict;
}

/**
 * Documents a PATCH's 409 — a stale version (VersionConflict with the current record) or another refusal (the
 * problem body, described by `refusals`) — and answers a stale version with the current record.
 */
export function StaleEditAnswers(record: Type | [Type], refusals: string): MethodDecorator {
  const model = conflictModel(record);
  return applyDecorators(
    UseFilters(StaleEditFilter),
    ApiExtraModels(model, ProblemDto),
    ApiConflictResponse({
      schema: { anyOf: [{ $ref: getSchemaPath(model) }, { $ref: getSchemaPath(ProblemDto) }] },
      description: `The version is stale: VersionConflict with the current record, nothing written. Or ${refusals}`,
    }),
  );
}
