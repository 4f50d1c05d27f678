import { UnprocessableEntityException } from '@nestjs/common';

export interface FieldProblem {
  field: string;
  message: string;
}

/** 422 in the same shape as the validation pipe's answer, for checks that need the stored rows. */
export class FieldProblemsException extends UnprocessableEntityException {
  constructor(problems: FieldProblem[], message = `Please correct: ${problems.map((p) => p.message.replace(/\.$/, '')).join('; ')}.`) {
    super({ statusCode: 422, error: 'Unprocessable Entity', message, errors: problems });
  }
}

/** Throws FieldProblemsException when any problem was found. */
export function throwIfProblems(problems: FieldProblem[]): void {
  if (problems.length) throw new FieldProblemsException(problems);
}
