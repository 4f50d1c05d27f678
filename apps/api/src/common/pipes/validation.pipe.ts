import { UnprocessableEntityException, ValidationPipe, type ArgumentMetadata, type ValidationError } from '@nestjs/common';
import { findTextProblems, type FieldTextProblem } from '../input/text-safety';

function flatten(errors: ValidationError[], parent = ''): Array<{ field: string; message: string }> {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own = Object.values(error.constraints ?? {}).map((message) => ({
      field,
      message: message.replace(/^property (\S+) should not exist$/, '$1 is not a known field'),
    }));
    return [...own, ...flatten(error.children ?? [], field)];
  });
}

function refusal(details: ReadonlyArray<{ field: string; message: string }>): UnprocessableEntityException {
  return new UnprocessableEntityException({
    statusCode: 422,
    error: 'Unprocessable Entity',
    message: `Please correct: ${details.map((d) => d.message).join('; ')}.`,
    errors: details,
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
