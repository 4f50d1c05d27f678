import type { Measure } from '@friable/contracts';
import { findUnit } from '@friable/field';
import { decimalToNumber } from '../common/decimal';
import type { FieldProblem } from '../common/exceptions/field-problems.exception';
import type { MeasureRow } from './models/measure.model';

/** A measure row as the API answers it. */
export function presentMeasure(row: MeasureRow): Measure {
  return {
    id: row.id,
    version: row.version,
    code: row.code,
    name: row.name,
    unit: row.unit,
    kind: row.kind,
    scaleMin: decimalToNumber(row.scaleMin),
    scaleMax: decimalToNumber(row.scaleMax),
    cutoff: decimalToNumber(row.cutoff),
    plausibleMin: decimalToNumber(row.plausibleMin),
    plausibleMax: decimalToNumber(row.plausibleMax),
    hardMin: decimalToNumber(row.hardMin),
    hardMax: decimalToNumber(row.hardMax),
    decimals: row.decimals,
    higherIsBetter: row.higherIsBetter,
    position: row.position,
  };
}

type MeasureFields = Omit<Measure, 'id' | 'version' | 'code' | 'name' | 'decimals' | 'higherIsBetter' | 'position'>;

function orderProblem(low: number | null, high: number | null, lowField: string, highField: string): FieldProblem[] {
  return low !== null && high !== null && low > high ? [{ field: lowField, message: `${lowField} must not be above ${highField}` }] : [];
}

/** Checks between a measure's fields (kind, unit, scale, cut-off, limits), each naming the field to correct. */
export function measureProblems(m: MeasureFields): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const dimension = findUnit(m.unit)?.dimension;
  if (m.kind === 'score') {
    if (m.unit !== 'score') problems.push({ field: 'unit', message: 'unit must be score for a measure of kind score' });
    if (m.scaleMin === null) problems.push({ field: 'scaleMin', message: 'scaleMin is needed for a score' });
    if (m.scaleMax === null) problems.push({ field: 'scaleMax', message: 'scaleMax is needed for a score' });
    if (m.scaleMin !== null && m.scaleMax !== null && m.scaleMin >= m.scaleMax) problems.push({ field: 'scaleMin', message: 'scaleMin must be below scaleMax' });
  }
  if (m.kind === 'count' && m.unit !== 'count') problems.push({ field: 'unit', message: 'unit must be count for a measure of kind count' });
  if (m.kind === 'time-with-cutoff') {
    if (dimension !== 'time') problems.push({ field: 'unit', message: 'unit must be a time unit (s, min, h) for a time with a cut-off' });
    if (m.cutoff === null) problems.push({ field: 'cutoff', message: 'cutoff is needed for a time with a cut-off' });
  }
  if (m.kind === 'continuous' && (dimension === 'score' || dimension === 'count')) {
    problems.push({ field: 'kind', message: `kind must be ${dimension} for the unit ${m.unit}` });
  }
  problems.push(...orderProblem(m.plausibleMin, m.plausibleMax, 'plausibleMin', 'plausibleMax'));
  problems.push(...orderProblem(m.hardMin, m.hardMax, 'hardMin', 'hardMax'));
  problems.push(...orderProblem(m.hardMin, m.plausibleMin, 'hardMin', 'plausibleMin'));
  problems.push(...orderProblem(m.plausibleMax, m.hardMax, 'plausibleMax', 'hardMax'));
  return problems;
}
