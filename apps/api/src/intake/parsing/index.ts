// Intake's pure core: reading, mapping and checking an uploaded CSV file (no database, no Nest).
export { IntakeFileError, type IntakeFileStatus } from './intake-file.error';
export { decodeCsvText } from './decode-csv-text';
export { readDecimalText, type DecimalTextProblem, type DecimalTextReading } from './decimal-text';
export { INTAKE_MAX_BYTES, INTAKE_MAX_CELL_CHARACTERS, INTAKE_MAX_COLUMNS, readCsvFile, type CsvDelimiter, type CsvFile } from './read-csv-file';
export { convertDecimalText, unitFactor, type UnitFactor } from './unit-factor';
export {
  COLUMN_ROLES,
  mapColumns,
  normaliseHeader,
  templateHeader,
  type ColumnMapping,
  type ColumnOverrides,
  type ColumnRole,
  type MeasureColumn,
} from './map-columns';
export { looksLikeFormula, neutraliseFormula } from './neutralise-formula';
export { parseCellValue, type CellOptions, type CellValue } from './parse-value';
export {
  INTAKE_PROBLEM_CAP,
  validateIntake,
  type IntakeValidation,
  type IntakeValidationInput,
  type IntakeValue,
  type SitePlot,
} from './validate-intake';
export {
  describeStoredValue,
  planChanges,
  type ChangePlan,
  type ExistingValue,
  type IncomingValue,
  type PlanOptions,
  type PlannedChange,
} from './plan-changes';
