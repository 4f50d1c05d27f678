import { registerDecorator, type ValidationArguments, type ValidationOptions } from 'class-validator';
import { checkNumber, checkNumberText, numberBoundMessage, shownNumber } from '../../common/input/number-bounds';

const decimalText = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const MAX_LABEL = 100;
const MAX_REPORTED = 5;

const isNumeric = (v: unknown) => (typeof v === 'number' && Number.isFinite(v)) || (typeof v === 'string' && decimalText.test(v.trim()));

/** A number field of a row: within the shared bounds (checked before anything parses it), then numeric. */
function decimalProblem(row: number, field: string, v: unknown): string | null {
  const bound = typeof v === 'number' ? checkNumber(v) : typeof v === 'string' ? checkNumberText(v) : null;
  if (bound && !bound.ok) {
    const shown = typeof v === 'string' ? `"${shownNumber(v)}"` : shownNumber(String(v));
    return numberBoundMessage(`observations[${row}].${field} ${shown}`, bound.problem).replace(/\.$/, '');
  }
  return isNumeric(v) ? null : `observations[${row}].${field} must be a finite number or a decimal string`;
}

/** Fields some analyses add to an observation, and what each must hold. */
export type ExtraObservationFields = Readonly<Record<string, 'boolean' | 'label' | 'decimal' | 'required-boolean' | 'required-label' | 'required-decimal'>>;

/** Whether a `value` of null (a plot not measured) is left out by the analysis or refused. */
export type MissingValues = 'left-out' | 'refused';

/** The problems of an observation list, each naming the row and field (at most a few, then a count). */
export function observationProblems(value: unknown, extra: ExtraObservationFields = {}, missing: MissingValues = 'refused'): string[] {
  if (!Array.isArray(value)) return ['observations must be a list'];
  if (value.length === 0) return ['observations must not be empty'];
  const problems: string[] = [];
  const label = (row: number, field: string, text: unknown) => {
    if (text === undefined || text === null) return;
    if (typeof text !== 'string' || text.length === 0 || text.length > MAX_LABEL) {
      problems.push(`observations[${row}].${field} must be text of 1 to ${MAX_LABEL} characters`);
    }
  };
  value.forEach((item: unknown, row) => {
    if (problems.length > MAX_REPORTED) return;
    if (typeof item !== 'object' || item === null || Array.isArray(item)) {
      problems.push(`observations[${row}] must be an object`);
      return;
    }
    const o = item as Record<string, unknown>;
    for (const key of Object.keys(o)) {
      if (!['treatment', 'factors', 'block', 'site', 'value'].includes(key) && !(key in extra)) problems.push(`observations[${row}].${key} is not a known field`);
    }
    for (const [key, kind] of Object.entries(extra)) {
      const field = o[key];
      if (field === undefined || field === null) {
        if (kind.startsWith('required-')) problems.push(`observations[${row}].${key} is needed`);
        continue;
      }
      if (kind.endsWith('boolean') && typeof field !== 'boolean') problems.push(`observations[${row}].${key} must be true or false`);
      if (kind.endsWith('label')) label(row, key, field);
      const fieldProblem = kind.endsWith('decimal') ? decimalProblem(row, key, field) : null;
      if (fieldProblem) problems.push(fieldProblem);
    }
    label(row, 'treatment', o.treatment);
    label(row, 'block', o.block);
    label(row, 'site', o.site);
    if (o.factors !== undefined) {
      if (typeof o.factors !== 'object' || o.factors === null || Array.isArray(o.factors)) problems.push(`observations[${row}].factors must be an object of factor name to level`);
      else if (Object.keys(o.factors).length > 4) problems.push(`observations[${row}].factors must name at most 4 factors`);
      else for (const [name, level] of Object.entries(o.factors)) label(row, `factors.${name}`, level);
    }
    const valueProblem = o.value === null && missing === 'left-out' ? null : decimalProblem(row, 'value', o.value);
    if (valueProblem) problems.push(valueProblem);
  });
  if (problems.length > MAX_REPORTED) return [...problems.slice(0, MAX_REPORTED), `and more problems after observations[${MAX_REPORTED}]`];
  return problems;
}

/** Checks a (possibly very long) list of observations in one pass, faster than nested DTO classes. */
export function IsObservationList(options?: ValidationOptions, extra: ExtraObservationFields = {}, missing: MissingValues = 'refused') {
  return (target: object, propertyName: string) =>
    registerDecorator({
      name: 'isObservationList',
      target: target.constructor,
      propertyName,
      options,
      validator: {
        validate: (value: unknown) => observationProblems(value, extra, missing).length === 0,
        defaultMessage: (args: ValidationArguments) => observationProblems(args.value, extra, missing).join('; '),
      },
    });
}
