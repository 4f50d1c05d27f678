import { UnprocessableEntityException, ValidationPipe, type ValidationError } from '@nestjs/common';

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

/** Whitelisting, transforming validation that answers 422 with one message per field. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    transformOptions: { enableImplicitConversion: false },
    exceptionFactory: (errors) => {
      const details = flatten(errors);
      return new UnprocessableEntityException({
        statusCode: 422,
        error: 'Unprocessable Entity',
        message: `Please correct: ${details.map((d) => d.message).join('; ')}.`,
        errors: details,
      });
    },
  });
}
