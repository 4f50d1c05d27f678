import type { AppliedUnit, Factor, FactorLevel as FactorLevelShape, TrialDesign } from '@friable/contracts';
import { DESIGN_RULES, appliedUnit } from '@friable/field';
import { presentMaterialRate } from '../treatments/treatment.presenter';
import type { FactorLevel } from './models/factor-level.model';
import type { TrialFactor } from './models/trial-factor.model';

/** Where a factor's levels go on; a factor beyond the design's count (left from another design) is shown as per plot. */
export function appliedUnitOf(design: TrialDesign, index: number): AppliedUnit {
  return index < DESIGN_RULES[design].maxFactors ? appliedUnit(design, index) : 'plot';
}

export function presentLevel(row: FactorLevel): FactorLevelShape {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    description: row.description,
    ...presentMaterialRate(row),
  };
}

/** A factor row and its levels (in their order) as the API answers them. */
export function presentFactor(row: TrialFactor, design: TrialDesign, index: number): Factor {
  return {
    id: row.id,
    version: row.version,
    position: row.position,
    name: row.name,
    appliedTo: appliedUnitOf(design, index),
    levels: [...(row.levels ?? [])].sort((x, y) => x.position - y.position).map(presentLevel),
  };
}
