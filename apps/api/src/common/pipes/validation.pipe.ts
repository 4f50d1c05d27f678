import { UnprocessableEntityException, ValidationPipe, type ArgumentMetadata, type ValidationError } from '@nestjs/common';
import { inPeoplesWords } from '../input/field-words';
import { findTextProblems, type FieldTextProblem } from '../input/text-safety';

/**
 * One problem per field: of the checks a value failed, the last declared (the check of its kind —
 * "must be a number" — comes last, so a value of the wrong kind is not also told it is too large).
 */
function flatten(errors: ValidationError[], parent = ''): Array<{ field: string; message: string }> {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const last = Object.values(error.constraints ?? {}).at(-1);
    const own = last === undefined ? [] : [{ field, message: last.replace(/^property (\S+) should not exist$/, '$1 is not a known field') }];
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

/** The refusal names fields as people see them ("plausible minimum", not "plausibleMin"); `errors` keeps each field's key for forms. */
function refusal(details: ReadonlyArray<{ field: string; message: string }>): UnprocessableEntityException {
  const worded = details.map((d) => ({ field: d.field, message: inPeoplesWords(d.message) }));
  return new UnprocessableEntityException({
    statusCode: 422,
    error: 'Unprocessable Entity',
    message: `Please correct: ${worded.map((d) => d.message).join('; ')}.`,
    errors: worded,
  });
}

/**
 * The global pipe: text fit to keep first (no NUL, no unpaired surrogate, in the body, the query
 * and the path parameters), then class-validator with whitelisting and transformation.
 */
class FriableValidationPipe extends ValidationPipe {
  override async transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    if (metadata.type !== 'custom') {
      const problems: FieldTextProblem[] = findTextProblems(metadata.data ? { [metadata.data]: value } : value);
      if (problems.length > 0) throw refusal(problems);
    }
    return super.transform(value, metadata);
  }
}

/** Whitelisting, transforming validation that answers 422 with one message per field. */
export function createValidationPipe(): ValidationPipe {
  return new FriableValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    transformOptions: { enableImplicitConversion: false },
    exceptionFactory: (errors) => refusal(flatten(errors)),
  });
}
