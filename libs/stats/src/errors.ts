/**
 * StatsInputError: the one error class the statistics engine throws for input it cannot analyse.
 *
 * It extends RangeError so that callers which already treat RangeError as "bad numbers in"
 * keep working. Messages follow one pattern: `<what is wrong>: <detail>`, e.g.
 * `non-finite value: observation 7 is "abc"`.
 *
 * Reference: the error conventions in Friable's STYLE.md ("typed errors, one message pattern").
 * @example
 *   throw new StatsInputError('too few treatments', 'an analysis needs at least two treatments, found 1');
 *   // message: "too few treatments: an analysis needs at least two treatments, found 1"
 */
export class StatsInputError extends RangeError {
  /** Short machine-friendly description of the problem, e.g. `too few treatments`. */
  readonly problem: string;

  constructor(problem: string, detail: string) {
    super(`${problem}: ${detail}`);
    this.name = 'StatsInputError';
    this.problem = problem;
  }
}
