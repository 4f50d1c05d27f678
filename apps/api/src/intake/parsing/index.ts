// Intake's pure core: reading, mapping and checking an uploaded CSV file (no database, no Nest).
export { IntakeFileError, type IntakeFileStatus } from './intake-file.error';
export { CsvReader, type RawRow } from './csv-reader';
export { SitePlotIndex, plotLabelKey } from './site-plot-index';
export { HEADER_SEARCH_ROWS, readHeaderCells, TableRows, type SourceRow, type TableHeader, type TableRow } from './table-rows';
export { readDecimalText, type DecimalTextProblem, type DecimalTextReading } from './decimal-text';
export { DecimalMarkCount, INTAKE_MAX_BYTES, INTAKE_MAX_CELL_CHARACTERS, INTAKE_MAX_COLUMNS, readCsvFile, tooLarge, type CsvDelimiter, type CsvFile } from './read-csv-file';
export { convertDecimalText, unitFactor, type UnitFactor } from './unit-factor';
export {
  COLUMN_ROLES,
  mapColumns,
  normaliseHeader,
  templateHeader,
  type ColumnMapping,
  type ColumnOverrides,
  type ColumnRole,
  type IdentityColumnAt,
  type MeasureColumn,
} from './map-columns';
export { looksLikeFormula, neutraliseFormula } from './neutralise-formula';
export { parseCellValue, type CellOptions, type CellValue } from './parse-value';
export {
  INTAKE_PROBLEM_CAP,
  IntakeChecker,
  validateIntake,
  type IntakeCheckerOptions,
  type OtherSiteLookup,
  type StorageChecks,
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
