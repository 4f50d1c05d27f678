export { EXACT_FACTORS } from './exact-factors';
export {
  MEASURE_UNITS,
  convertValue,
  findUnit,
  findUnitByText,
  parseUnitFromHeader,
  type MeasureDimension,
  type MeasureUnit,
  type ParsedHeader,
} from './units';
export { plotSurfaceAreaM2, type PlotGeometry } from './plot-geometry';
export {
  RATE_UNITS,
  findRateUnit,
  type MassRateUnit,
  type RateUnit,
  type RateUnitDefinition,
  type VolumeRateUnit,
} from './rate-units';
export { RATE_PLAUSIBILITY_LIMITS, rateWarnings, type MaterialKind } from './rate-plausibility';
export {
  computeDose,
  trialTotal,
  type DoseBasis,
  type DoseInput,
  type DoseResult,
  type TrialTotal,
  type TrialTotalInput,
} from './rates';
export { infiltrationRate, type InfiltrationInput, type InfiltrationRate } from './infiltration';
export {
  DESIGN_RULES,
  TRIAL_DESIGNS,
  appliedUnit,
  isFactorDesign,
  plotsPerAppliedUnit,
  requireTrialDesign,
  type AppliedUnit,
  type DesignRule,
  type TrialDesign,
} from './trial-designs';
export { factorCombinations, type CombinationLevel, type FactorCombination } from './factor-combinations';
export {
  plotLabelPrefix,
  randomizeSite,
  seedFromText,
  type PlotAssignment,
  type RandomizationFactor,
  type SiteRandomizationInput,
} from './randomize';
export { criticalFAt05, errorStrata, factorialTerms, type ErrorStratum, type StrataInput, type StratumFactor } from './design-strata';
export { DESIGN_MINIMUMS, designWarnings, type DesignCheckInput } from './design-checks';
export { DATA_COLUMNS, IDENTITY_COLUMNS, RECORD_COLUMNS, dataColumnOfHeader, normaliseHeader, type DataColumn } from './data-columns';
export { workbookCellText } from './workbook-cell-text';
