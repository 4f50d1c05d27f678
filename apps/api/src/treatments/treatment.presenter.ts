import type { MaterialRate, Treatment } from '@friable/contracts';
import { findRateUnit } from '@friable/field';
import type { FieldProblem } from '../common/exceptions/field-problems.exception';
import { decimalToNumber } from '../common/decimal';
import { levelIdsOf } from './factor-level-columns';
import type { TreatmentRow } from './models/treatment.model';

type RateColumns = Pick<TreatmentRow, 'rateValue' | 'rateUnit' | 'rateBasis' | 'incorporationDepthCm' | 'product' | 'purity' | 'moistureBasis' | 'moistureFraction' | 'materialKind'>;

/** The rate and material columns of a treatment or factor level row, DECIMAL text turned into numbers. */
export function presentMaterialRate(row: RateColumns): MaterialRate {
  return {
    rateValue: decimalToNumber(row.rateValue),
    rateUnit: row.rateUnit,
    rateBasis: row.rateBasis,
    incorporationDepthCm: decimalToNumber(row.incorporationDepthCm),
    product: row.product,
    purity: decimalToNumber(row.purity),
    moistureBasis: row.moistureBasis,
    moistureFraction: decimalToNumber(row.moistureFraction),
    materialKind: row.materialKind,
  };
}

/** A treatment row as the API answers it. */
export function presentTreatment(row: TreatmentRow): Treatment {
  return {
    id: row.id,
    version: row.version,
    code: row.code,
    name: row.name,
    description: row.description,
    isControl: row.isControl,
    ...presentMaterialRate(row),
    factorLevelIds: levelIdsOf(row),
    position: row.position,
  };
}

type RateFields = Pick<Treatment, 'rateValue' | 'rateUnit' | 'rateBasis' | 'incorporationDepthCm' | 'purity' | 'moistureBasis' | 'moistureFraction'>;

/** Checks between fields of a treatment's rate, each naming the field to correct. */
export function treatmentRateProblems(t: RateFields): FieldProblem[] {
  const problems: FieldProblem[] = [];
  if (t.rateValue !== null && t.rateUnit === null) problems.push({ field: 'rateUnit', message: 'rateUnit is needed when a rateValue is given' });
  if (t.rateValue === null && t.rateUnit !== null) problems.push({ field: 'rateValue', message: 'rateValue is needed when a rateUnit is given' });
  if (t.rateBasis === 'concentration' && t.incorporationDepthCm === null) {
    problems.push({ field: 'incorporationDepthCm', message: 'incorporationDepthCm is needed for a rate per soil volume (concentration basis)' });
  }
  const unit = t.rateUnit ? findRateUnit(t.rateUnit) : undefined;
  if (unit?.kind === 'volume' && t.purity !== null && t.purity !== 1) {
    problems.push({ field: 'purity', message: 'purity applies only to mass rates, not to a depth or volume rate' });
  }
  if (t.moistureBasis === 'dry' && t.moistureFraction === null) {
    problems.push({ field: 'moistureFraction', message: 'moistureFraction is needed for a rate on a dry basis' });
  }
  if (unit?.kind === 'volume' && t.moistureBasis === 'dry') {
    problems.push({ field: 'moistureBasis', message: 'moistureBasis dry applies only to mass rates' });
  }
  return problems;
}
