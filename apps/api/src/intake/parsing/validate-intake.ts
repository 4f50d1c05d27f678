import type { IntakeProblem, Measure } from '@friable/contracts';
import { IDENTITY_COLUMNS } from '@friable/field';
import type { ColumnMapping, MeasureColumn } from './map-columns';
import { templateHeader } from './map-columns';
import { parseCellValue } from './parse-value';
import type { CsvFile } from './read-csv-file';
import { SitePlotIndex, plotLabelKey } from './site-plot-index';
import type { TableRow } from './table-rows';

/** Most errors (and, apart, warnings) listed; one more line says how many were left out. */
export const INTAKE_PROBLEM_CAP = 500;

export interface SitePlot {
  readonly id: number;
  readonly label: string;
  readonly block: number;
  readonly treatmentCode: string;
  /** The plot's value for each identity column beyond block and treatment that a design adds (whole plot, sub-plot…). */
  readonly identity?: Readonly<Record<string, string>>;
}

export interface IntakeValue {
  readonly plotId: number;
  readonly plotLabel: string;
  readonly measureId: number;
  readonly measureCode: string;
  /** Canonical decimal text in the measure's unit; null when missing. */
  readonly valueText: string | null;
  readonly censored: boolean;
  /** From the reason column, for missing values only. */
  readonly missingReason: string | null;
  /** True when the cell was empty (rather than NA or a dash). */
  readonly blank: boolean;
  /** The row's notes, exactly as typed (formulas included: neutralise them on export). */
  readonly notes: string | null;
  /** Spreadsheet row number (the header is row 1). */
  readonly row: number;
}

/** Checks a value must pass to be stored (the table's limits), each a sentence or null. */
export interface StorageChecks {
  value(valueText: string): string | null;
  reason(reason: string): string | null;
}

export interface IntakeValidationInput {
  readonly file: CsvFile;
  readonly mapping: ColumnMapping;
  /** Every plot of the site the file is uploaded for. */
  readonly sitePlots: readonly SitePlot[];
  /** Every plot label of the trial, with the site it belongs to. */
  readonly trialPlotLabels: ReadonlyMap<string, { readonly siteId: number; readonly siteName: string }>;
  readonly roundMeasures: readonly Measure[];
  readonly siteName: string;
}

export interface IntakeValidation {
  readonly values: readonly IntakeValue[];
  /** Any error means nothing may be written. */
  readonly errors: readonly IntakeProblem[];
  /** Written only when the uploader accepts them explicitly. */
  readonly warnings: readonly IntakeProblem[];
}

/** Where a label the site does not have belongs instead: the other site's name by label key, or nothing. */
export type OtherSiteLookup = ReadonlyMap<string, string>;

interface PendingPlotProblem {
  readonly problem: { row: number; column: string; message: string };
  readonly label: string;
}

const blockPattern = /^(?:block\s*|b)?(\d+)$/i;

/** An identity column's check against the plot plan: the sentence for a disagreement, or null. */
function identityProblem(role: string, typed: string, plots: SitePlotIndex, position: number): string | null {
  const label = plots.label(position);
  if (role === 'block') {
    const match = blockPattern.exec(typed);
    if (!match) return `"${typed}" is not a block number.`;
    const block = plots.block(position);
    return Number(match[1]) === block ? null : `plot ${label} is in block ${block} in the plot plan, not ${typed}.`;
  }
  if (role === 'treatment') {
    const code = plots.treatmentCode(position);
    return typed.toUpperCase() === code.toUpperCase() ? null : `plot ${label} is treatment ${code} in the plot plan, not ${typed}.`;
  }
  const planned = plots.identity(position, role);
  if (planned === undefined || planned.toUpperCase() === typed.toUpperCase()) return null;
  const words = IDENTITY_COLUMNS.find((column) => column.role === role)?.words ?? role;
  return `the plot plan gives plot ${label} ${planned} for ${words}, not ${typed}.`;
}

function columnNotes(mapping: ColumnMapping, roundMeasures: readonly Measure[]): IntakeProblem[] {
  const present = new Set(mapping.measures.map((column: MeasureColumn) => column.measureId));
  const absent = roundMeasures.filter((measure) => !present.has(measure.id));
  return [
    ...absent.map((measure) => ({
      row: null,
      column: null,
      message: `The file has no column for ${measure.name} (the template calls it "${templateHeader(measure)}"), so no ${measure.name} values are read from it.`,
    })),
    ...mapping.unmapped.map((header) => ({ row: null, column: header, message: `Column "${header}" is not a measure of this round and is not read.` })),
  ];
}

/** A list that keeps its first 500 entries and counts the rest. */
class CappedList {
  readonly kept: IntakeProblem[] = [];
  left = 0;

  constructor(first: readonly IntakeProblem[] = []) {
    for (const problem of first) this.add(problem);
  }

  get count(): number {
    return this.kept.length + this.left;
  }

  add(problem: IntakeProblem): boolean {
    if (this.kept.length < INTAKE_PROBLEM_CAP) {
      this.kept.push(problem);
      return true;
    }
    this.left += 1;
    return false;
  }

  result(): readonly IntakeProblem[] {
    const all = this.left > 0 ? [...this.kept, { row: null, column: null, message: `…and ${this.left} more like these.` }] : this.kept;
    return Object.freeze(all.map((problem) => Object.freeze(problem)));
  }
}

export interface IntakeCheckerOptions {
  readonly mapping: ColumnMapping;
  readonly headers: readonly string[];
  readonly plots: SitePlotIndex;
  readonly roundMeasures: readonly Measure[];
  readonly siteName: string;
  readonly decimalComma: boolean;
  /** The reason for NA values of rows that give none (chosen for the whole file); absent or null: each row must. */
  readonly missingReason?: string | null;
  /** Every value of every row that has a plot, in file order (blank cells included). */
  readonly onValue: (value: IntakeValue) => void;
  readonly storage?: StorageChecks;
}

/**
 * Intake checker — checks an uploaded file row by row against the site's plot plan and the
 * round's measures, handing each value on as soon as its row is read and listing every problem
 * by row and column.
 *
 * Purpose: the all-or-nothing rule of Intake, for files of any length. Errors: the mapping's
 * problems (no plot label column, units Friable cannot convert, two columns for one measure), an
 * empty or unknown plot label, a plot of another site ("plot QH-B1-P03 belongs to Quarry Hill
 * Garden, not Hollow Lane", filled in by `finish` once the caller has looked the labels up), a
 * plot twice in the file (the later row names the earlier one), an identity column (block,
 * treatment code, …) that disagrees with the plot plan, every value `parseCellValue` refuses, and
 * values the table cannot store. Warnings: values outside the usual range, more decimals than
 * usual, round measures without a column, columns nothing reads. There is no early exit; each
 * list stops at 500 with a line saying how many more there are.
 *
 * Rows: `row` is the row number a spreadsheet shows for the file (the header is row 1 when the
 * file starts with it). Columns: the header as written. Messages repeat both:
 * `Row 4, drain time (s): "abc" is not a number.` Plot labels match without regard to case or
 * surrounding spaces.
 * Throws: nothing; a mapping without a plot label column gives only the mapping's errors.
 * Example: `checker.check({ cells: ['HL-B2-P03', 'CTRL'], rowNumber: 4 })` with a treatment column →
 * error `{ row: 4, column: 'treatment code', message: 'Row 4, treatment code: plot HL-B2-P03 is treatment GYP in the plot plan, not CTRL.' }`
 */
export class IntakeChecker {
  private readonly errors: CappedList;
  private readonly warnings: CappedList;
  private readonly measuresById: ReadonlyMap<number, Measure>;
  private readonly firstRowOf: Int32Array;
  private readonly unknownPlots: PendingPlotProblem[] = [];
  private readonly readableColumns: readonly MeasureColumn[];
  /** Measure id → the column of that measure's own notes. */
  private readonly noteColumnOf: ReadonlyMap<number, number>;
  private readonly columnNoteCount: number;
  private rowsChecked = 0;
  private valuesRead = 0;

  constructor(private readonly options: IntakeCheckerOptions) {
    this.errors = new CappedList(options.mapping.problems);
    const notes = columnNotes(options.mapping, options.roundMeasures);
    this.columnNoteCount = notes.length;
    this.warnings = new CappedList(notes);
    this.measuresById = new Map(options.roundMeasures.map((measure) => [measure.id, measure]));
    this.firstRowOf = new Int32Array(options.plots.size);
    this.readableColumns = options.mapping.measures.filter((column) => column.problems.length === 0);
    this.noteColumnOf = new Map(options.mapping.measureNotes.map((column) => [column.measureId, column.index]));
  }

  get rows(): number {
    return this.rowsChecked;
  }

  get values(): number {
    return this.valuesRead;
  }

  get errorCount(): number {
    return this.errors.count;
  }

  /** Warnings about values (they have a row); notes about columns have none. */
  get valueWarningCount(): number {
    return this.warnings.count - this.columnNoteCount;
  }

  /** A problem of a whole row found while reading it (values beyond the header). */
  addRowProblem(problem: IntakeProblem): void {
    this.errors.add(problem);
  }

  check(row: TableRow): void {
    this.rowsChecked += 1;
    const { mapping } = this.options;
    if (mapping.plotLabel === null) return;
    const position = this.findPlot(row);
    if (position >= 0) this.checkIdentity(row, position);
    this.readMeasureCells(row, position);
  }

  /** Labels of the rows whose plot the site does not have (at most 500): look up which site has them, then call `finish`. */
  labelsToLookUp(): string[] {
    return [...new Set(this.unknownPlots.map((pending) => pending.label))];
  }

  finish(otherSites: OtherSiteLookup = new Map()): Omit<IntakeValidation, 'values'> {
    for (const { problem, label } of this.unknownPlots) {
      const elsewhere = otherSites.get(plotLabelKey(label));
      const text = elsewhere
        ? `plot ${label} belongs to ${elsewhere}, not ${this.options.siteName}.`
        : `there is no plot ${label} in this trial; check the label against the plot plan.`;
      problem.message = `Row ${problem.row}, ${problem.column}: ${text}`;
    }
    return Object.freeze({ errors: this.errors.result(), warnings: this.warnings.result() });
  }

  private problemAt(row: TableRow, column: number | null, message: string): IntakeProblem {
    const header = column === null ? null : this.options.headers[column]!;
    return { row: row.rowNumber, column: header, message: `Row ${row.rowNumber}${header === null ? '' : `, ${header}`}: ${message}` };
  }

  /** The row's plot position, or −1 (the reason is among the errors). */
  private findPlot(row: TableRow): number {
    const column = this.options.mapping.plotLabel!;
    const label = row.cells[column]!.trim();
    if (label === '') {
      this.errors.add(this.problemAt(row, column, 'the plot label is empty.'));
      return -1;
    }
    const { plots } = this.options;
    const position = plots.find(label);
    if (position < 0) {
      const problem = { row: row.rowNumber, column: this.options.headers[column]!, message: '' };
      if (this.errors.add(problem)) this.unknownPlots.push({ problem, label });
      return -1;
    }
    const firstRow = this.firstRowOf[position]!;
    if (firstRow !== 0) {
      this.errors.add(this.problemAt(row, column, `plot ${plots.label(position)} is also on row ${firstRow}; each plot may appear once in a file.`));
      return -1;
    }
    this.firstRowOf[position] = row.rowNumber;
    return position;
  }

  private checkIdentity(row: TableRow, position: number): void {
    for (const column of this.options.mapping.identity) {
      const typed = row.cells[column.index]!.trim();
      if (typed === '') continue;
      const problem = identityProblem(column.role, typed, this.options.plots, position);
      if (problem) this.errors.add(this.problemAt(row, column.index, problem));
    }
  }

  private readMeasureCells(row: TableRow, position: number): void {
    const { mapping, plots, decimalComma, storage } = this.options;
    const textAt = (index: number | null): string | null => {
      const text = index === null ? '' : row.cells[index]!.trim();
      return text === '' ? null : text;
    };
    const rowNotes = textAt(mapping.notes);
    // A measure's own note goes to its value alone; the row's notes go to every value of the row (both: own note first).
    const notesOf = (measureId: number): string | null => {
      const own = textAt(this.noteColumnOf.get(measureId) ?? null);
      return own !== null && rowNotes !== null ? `${own}; ${rowNotes}` : (own ?? rowNotes);
    };
    const ownReason = textAt(mapping.missingReason);
    const missingReason = ownReason ?? this.options.missingReason ?? null;
    let reasonChecked = false;
    for (const column of this.readableColumns) {
      const cellProblem = row.cellProblems?.get(column.index);
      if (cellProblem) {
        this.errors.add(this.problemAt(row, column.index, cellProblem));
        continue;
      }
      const measure = this.measuresById.get(column.measureId)!;
      const cell = parseCellValue(row.cells[column.index]!, measure, { decimalComma, headerUnit: column.headerUnitId });
      if (cell.kind === 'error') {
        this.errors.add(this.problemAt(row, column.index, cell.message));
        continue;
      }
      if (cell.kind === 'value') {
        for (const warning of cell.warnings) this.warnings.add(this.problemAt(row, column.index, warning));
        const unstorable = storage?.value(cell.valueText);
        if (unstorable) {
          this.errors.add(this.problemAt(row, column.index, unstorable));
          continue;
        }
      } else if (!cell.blank && missingReason === null) {
        // A value written as NA was missed on purpose: the file says why, or the upload is refused.
        const where = mapping.missingReason === null ? 'add a “missing reason” column saying why' : `write why in the ${this.options.headers[mapping.missingReason]} column`;
        this.errors.add(this.problemAt(row, column.index, `${measure.name} is NA (missing) without a reason: ${where} (for example “bed flooded”).`));
        continue;
      } else if (ownReason !== null && !reasonChecked && storage) {
        reasonChecked = true;
        const tooLong = storage.reason(ownReason);
        if (tooLong) this.errors.add(this.problemAt(row, mapping.missingReason, tooLong));
      }
      if (position < 0) continue;
      this.valuesRead += 1;
      this.options.onValue({
        plotId: plots.id(position),
        plotLabel: plots.label(position),
        measureId: column.measureId,
        measureCode: column.measureCode,
        valueText: cell.kind === 'value' ? cell.valueText : null,
        censored: cell.kind === 'value' && cell.censored,
        missingReason: cell.kind === 'missing' ? missingReason : null,
        blank: cell.kind === 'missing' && cell.blank,
        notes: notesOf(column.measureId),
        row: row.rowNumber,
      });
    }
  }
}

/**
 * Validate intake — checks a whole file read into memory (`readCsvFile`): `IntakeChecker` over
 * every row, with the plot labels of the trial at hand.
 *
 * Purpose: the pure core's one-call form, for small files and tests; Intake itself streams.
 * Throws: nothing. Example: `validateIntake({ file, mapping, sitePlots, trialPlotLabels, roundMeasures, siteName: 'Hollow Lane' }).errors`
 * → `[{ row: 4, column: 'treatment code', message: 'Row 4, treatment code: plot HL-B2-P03 is treatment GYP in the plot plan, not CTRL.' }]`
 */
export function validateIntake(input: IntakeValidationInput): IntakeValidation {
  const { file, mapping, sitePlots, roundMeasures, siteName } = input;
  const values: IntakeValue[] = [];
  const checker = new IntakeChecker({
    mapping,
    headers: file.headers,
    plots: SitePlotIndex.of(sitePlots),
    roundMeasures,
    siteName,
    decimalComma: file.decimalComma,
    onValue: (value) => values.push(Object.freeze(value)),
  });
  file.rows.forEach((cells, index) => checker.check({ cells, rowNumber: file.rowNumbers[index]! }));
  const otherSites = new Map([...input.trialPlotLabels].map(([label, site]) => [plotLabelKey(label), site.siteName] as const));
  return Object.freeze({ values: Object.freeze(values), ...checker.finish(otherSites) });
}
