import { INTAKE_CHANGE_LIST_CAP, type IntakeProblem, type Measure } from '@friable/contracts';
import { dataColumnOfHeader } from '@friable/field';
import { storableValue } from '../observations/storable-value';
import { IntakeChecker, TableRows, mapColumns, type ColumnMapping, type IntakeValue, type SitePlotIndex, type StorageChecks, type TableHeader } from './parsing';
import type { OpenedUpload, UploadReading } from './read-upload';
import { isBareBlank } from './value-lines';

const count = (value: number) => new Intl.NumberFormat('en').format(value);

/** The table's limits, checked with every other rule so a file that cannot be stored is refused by row and column. */
export const storageChecks: StorageChecks = {
  value(valueText) {
    if (valueText.length <= 20) return null;
    const storable = storableValue(valueText);
    return storable.ok ? null : storable.message;
  },
  reason(reason) {
    return reason.length <= 200 ? null : `the reason has ${count(reason.length)} characters; reasons of up to 200 are kept.`;
  },
};

export interface CheckUploadInput {
  readonly opened: OpenedUpload;
  readonly plots: SitePlotIndex;
  readonly measures: readonly Measure[];
  readonly siteName: string;
  /** The person's mapping step, then the trial's remembered choices (header → role, measure code or null). */
  readonly overrides: Readonly<Record<string, string | null>>;
  readonly remembered: Readonly<Record<string, string | null>>;
  /** The reason for NA values of rows that give none (chosen for the whole file), or null. */
  readonly missingReason: string | null;
  /** Which other sites have these labels (for "plot QH-B1-P03 belongs to Quarry Hill Garden"). */
  readonly otherSites: (labels: readonly string[]) => Promise<ReadonlyMap<string, string>>;
  /** Takes each value while the file has no error so far (the database loads them as they come). */
  readonly onValue: ((value: IntakeValue) => void) | null;
  /** Awaited between chunks: the database's pace. */
  readonly pause: () => Promise<void>;
  readonly onProgress: (rowsChecked: number, bytesRead: number) => void;
}

export interface CheckedUpload {
  readonly header: TableHeader;
  readonly mapping: ColumnMapping;
  /** The mapping the headers get by themselves (to tell which choices the person made). */
  readonly automatic: ColumnMapping;
  readonly rows: number;
  /** Values worth writing where nothing is stored (empty cells without a reason left out). */
  readonly values: number;
  readonly errors: readonly IntakeProblem[];
  readonly errorCount: number;
  readonly warnings: readonly IntakeProblem[];
  /** Warnings about values (those need acceptWarnings); notes about columns are only told. */
  readonly valueWarnings: number;
  readonly reading: UploadReading;
  /** The first values worth writing, in file order (at most INTAKE_CHANGE_LIST_CAP). */
  readonly firstValues: readonly IntakeValue[];
}

/** Whether a row is the header row: it has a cell naming the plot label (by the person's mapping, the trial's memory or its spelling). */
function namesPlotLabel(cells: readonly string[], overrides: CheckUploadInput['overrides'], remembered: CheckUploadInput['remembered']): boolean {
  return cells.some((cell) => {
    const header = cell.trim();
    if (header === '') return false;
    if (Object.hasOwn(overrides, header)) return overrides[header] === 'plotLabel';
    if (remembered[header] === 'plotLabel') return true;
    return dataColumnOfHeader(header)?.role === 'plotLabel';
  });
}

/** Merged ranges at or below the header row, as problems of their first row and column. */
function mergedProblems(reading: UploadReading, header: TableHeader): IntakeProblem[] {
  return reading.merged
    .filter((range) => range.lastRow >= header.rowNumber)
    .slice(0, 100)
    .map((range) => {
      const column = header.headers[range.firstColumn] || null;
      const message = `Row ${range.firstRow}${column ? `, ${column}` : ''}: cells ${range.ref} are merged. Unmerge them so every row has its own value in its own cell (in your spreadsheet program: select them, then unmerge), then upload the file again.`;
      return { row: range.firstRow, column, message };
    });
}

/** For a workbook with sheets besides the one read: which they are, and how to choose one ('' otherwise). */
function otherSheetsHint(reading: UploadReading): string {
  const others = reading.sheets.filter((sheet) => sheet.name !== reading.sheet);
  if (reading.sheet === null || others.length === 0) return '';
  return ` The workbook also has ${others.map((sheet) => `"${sheet.name}"`).join(', ')}: choose the one that holds the values as "Sheet" when you upload.`;
}

/**
 * Check upload — reads an opened upload row by row, finds its header row, maps its columns and
 * checks every row (`IntakeChecker`), handing each value on at once while the file is error-free.
 *
 * Purpose: the reading half of Intake, the same for CSV files and workbook sheets, never holding
 * the file. Rows above the header (a title) are skipped; merged cells at or below it are errors.
 * Throws: IntakeFileError when the file cannot be read as a table at all; row-level problems are
 * in `errors`, not thrown.
 * Example: `await checkUpload({ opened, plots, measures, siteName: 'Hollow Lane', overrides: {}, remembered: {}, … })`
 * → `{ rows: 9, values: 27, errors: [], warnings: [], … }`
 */
export async function checkUpload(input: CheckUploadInput): Promise<CheckedUpload> {
  const { opened, plots, measures, siteName, overrides, remembered } = input;
  const firstValues: IntakeValue[] = [];
  let header: TableHeader | null = null;
  let checker: IntakeChecker | null = null;
  let worth = 0;
  const table = new TableRows({
    isHeader: (cells) => namesPlotLabel(cells, overrides, remembered),
    onHeader: (found) => {
      header = found;
      checker = new IntakeChecker({
        mapping: mapColumns(found.headers, measures, overrides, remembered),
        headers: found.headers,
        plots,
        roundMeasures: measures,
        siteName,
        decimalComma: opened.decimalComma,
        storage: storageChecks,
        missingReason: input.missingReason,
        onValue: (value) => {
          // Once the file has an error nothing will be written: keep checking, stop handing values on.
          if (checker!.errorCount > 0) return;
          if (!isBareBlank(value)) {
            worth += 1;
            if (firstValues.length < INTAKE_CHANGE_LIST_CAP) firstValues.push(value);
          }
          input.onValue?.(value);
        },
      });
    },
    onRow: (row) => checker!.check(row),
    onRowProblem: (problem) => checker!.addRowProblem(problem),
  });
  const reading = await opened.read(
    (row) => table.push(row),
    (bytesRead) => input.onProgress(table.rowsRead, bytesRead),
    input.pause,
  );
  table.finish(`The file has a header row but no data rows (read as ${reading.readAs}).${otherSheetsHint(reading)}`);
  const found = header as TableHeader | null;
  const done = checker as IntakeChecker | null;
  if (!found || !done) throw new Error('checkUpload: a table with rows has a header');
  for (const problem of mergedProblems(reading, found)) done.addRowProblem(problem);
  const mapping = mapColumns(found.headers, measures, overrides, remembered);
  const hint = mapping.plotLabel === null ? otherSheetsHint(reading) : '';
  if (hint) done.addRowProblem({ row: null, column: null, message: `The sheet "${reading.sheet}" was read.${hint}` });
  const { errors, warnings } = done.finish(await input.otherSites(done.labelsToLookUp()));
  return {
    header: found,
    mapping,
    automatic: mapColumns(found.headers, measures),
    rows: done.rows,
    values: worth,
    errors,
    errorCount: done.errorCount,
    warnings,
    valueWarnings: done.valueWarningCount,
    reading,
    firstValues,
  };
}
