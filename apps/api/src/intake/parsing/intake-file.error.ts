import type { IntakeProblem } from '@friable/contracts';

/** HTTP status an intake file refusal answers with: 413 for an over-size file, 422 for everything else. */
export type IntakeFileStatus = 413 | 422;

/**
 * Intake file error — the uploaded file cannot be read as a table at all (empty, too large, not
 * UTF-8 text, a quote left open, no usable header row, rows wider than the header).
 *
 * Purpose: stop the intake before any row is looked at, with one sentence a gardener can act on
 * (`message`), the HTTP status the controller should answer with, and, where the trouble is in
 * particular rows, those rows as `problems` (row numbers as a spreadsheet shows them: the
 * header is row 1).
 *
 * Example: `new IntakeFileError('The file is empty.', 422)`
 */
export class IntakeFileError extends Error {
  override readonly name = 'IntakeFileError';

  constructor(
    message: string,
    readonly status: IntakeFileStatus = 422,
    readonly problems: readonly IntakeProblem[] = [],
  ) {
    super(message);
  }
}
