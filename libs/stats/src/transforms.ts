import { StatsInputError } from './errors';

/** A variance-stabilizing transform applied before the analysis. */
export type TransformKind = 'none' | 'log' | 'sqrt' | 'arcsine-sqrt';

/** Transformed values, the offset added before the log (0 or 1) and a note for the report. */
export interface TransformedValues {
  readonly values: number[];
  readonly offset: number;
  readonly note: string | null;
}

/**
 * Variance-stabilizing transform of a measure before ANOVA (Gomez & Gomez,
 * Statistical Procedures for Agricultural Research, 1984, §7.2.2; free overview:
 * https://en.wikipedia.org/wiki/Data_transformation_(statistics)):
 * - `log`: natural log, for values whose spread grows with the mean; when any
 *   value is 0 every value gets + 1 first (offset 1);
 * - `sqrt`: square root, for counts;
 * - `arcsine-sqrt`: asin(√p) in radians, for proportions p in [0, 1].
 *
 * @throws StatsInputError (a RangeError) naming the first value out of range:
 *   negative for log and sqrt, outside [0, 1] for arcsine-sqrt; non-finite for any kind.
 * @example transformValues([0, 1, 3], 'log') // { values: [0, 0.6931, 1.3863], offset: 1, note: 'log(x + 1) …' }
 */
export function transformValues(values: readonly number[], kind: TransformKind): TransformedValues {
  values.forEach((value, index) => {
    if (!Number.isFinite(value)) {
      throw new StatsInputError('non-finite value', `transformValues: value ${index + 1} is ${value}`);
    }
  });
  const firstOutside = (inRange: (value: number) => boolean, requirement: string): void => {
    const index = values.findIndex((value) => !inRange(value));
    if (index >= 0) {
      throw new StatsInputError(
        'value out of range',
        `transformValues (${kind}): value ${index + 1} is ${values[index]}, ${requirement}`,
      );
    }
  };
  switch (kind) {
    case 'none':
      return Object.freeze({ values: [...values], offset: 0, note: null });
    case 'log': {
      firstOutside((value) => value >= 0, 'the log transform needs values of 0 or more');
      const offset = values.some((value) => value === 0) ? 1 : 0;
      const note =
        offset === 1
          ? 'Analysed as log(x + 1) because some values are 0; means are back-transformed as exp(m) − 1.'
          : 'Analysed as log(x); means are back-transformed as exp(m) (geometric means).';
      return Object.freeze({ values: values.map((value) => Math.log(value + offset)), offset, note });
    }
    case 'sqrt':
      firstOutside((value) => value >= 0, 'the square-root transform needs values of 0 or more');
      return Object.freeze({
        values: values.map(Math.sqrt),
        offset: 0,
        note: 'Analysed as √x; means are back-transformed as m².',
      });
    case 'arcsine-sqrt':
      firstOutside((value) => value >= 0 && value <= 1, 'the arcsine-square-root transform needs proportions in [0, 1]');
      return Object.freeze({
        values: values.map((value) => Math.asin(Math.sqrt(value))),
        offset: 0,
        note: 'Analysed as asin(√p) in radians; means are back-transformed as sin(m)².',
      });
  }
}

/**
 * The original-scale value of a mean computed on the transformed scale: exp(m) − offset,
 * m², sin(m)² or m itself. A back-transformed log mean is a geometric mean, not the
 * arithmetic mean of the raw data.
 * @throws never.
 * @example backTransform(Math.log(4), 'log', 1) // 3
 */
export function backTransform(mean: number, kind: TransformKind, offset: number): number {
  switch (kind) {
    case 'none':
      return mean;
    case 'log':
      return Math.exp(mean) - offset;
    case 'sqrt':
      return mean * mean;
    case 'arcsine-sqrt':
      return Math.sin(mean) ** 2;
  }
}
