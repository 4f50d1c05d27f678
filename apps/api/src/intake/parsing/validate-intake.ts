import type { IntakeProblem, Measure } from '@friable/contracts';
import type { ColumnMapping, MeasureColumn } from './map-columns';
import { templateHeader } from './map-columns';
import { parseCellValue } from './parse-value';
import type { CsvFile } from './read-csv-file';

/** Most errors (and, apart, warnings) listed; one more line says how many were left out. */
export const INTAKE_PROBLEM_CAP = 500;

export interface SitePlot {
  readonly id: number;
  readonly label: string;
  readonly block: number;
  readonly treatmentCode: string;
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

const labelKey = (label: string): string => label.trim().toUpperCase();

function capped(problems: readonly IntakeProblem[]): readonly IntakeProblem[] {
  const kept = problems.length > INTAKE_PROBLEM_CAP ? problems.slice(0, INTAKE_PROBLEM_CAP) : [...problems];
  if (problems.length > INTAKE_PROBLEM_CAP) {
    kept.push({ row: null, column: null, message: `…and ${problems.length - INTAKE_PROBLEM_CAP} more like these.` });
  }
  return Object.freeze(kept.map((problem) => Object.freeze(problem)));
}

interface RowContext {
  readonly cells: readonly string[];
  readonly row: number;
  readonly headers: readonly string[];
  readonly errors: IntakeProblem[];
}

function problemAt(context: RowContext, column: number | null, message: string): IntakeProblem {
  const header = column === null ? null : context.headers[column]!;
  return { row: context.row, column: header, message: `Row ${context.row}${header === null ? '' : `, ${header}`}: ${message}` };
}

/** Checks the block and treatment cells against the plot plan. */
function checkPlan(context: RowContext, mapping: ColumnMapping, plot: SitePlot): void {
  const blockText = mapping.block === null ? '' : context.cells[mapping.block]!.trim();
  if (blockText !== '') {
    const match = /^(?:block\s*|b)?(\d+)$/i.exec(blockText);
    if (!match) context.errors.push(problemAt(context, mapping.block, `"${blockText}" is not a block number.`));
    else if (Number(match[1]) !== plot.block) {
      context.errors.push(problemAt(context, mapping.block, `plot ${plot.label} is in block ${plot.block} in the plot plan, not ${blockText}.`));
    }
  }
  const treatmentText = mapping.treatment === null ? '' : context.cells[mapping.treatment]!.trim();
  if (treatmentText !== '' && treatmentText.toUpperCase() !== plot.treatmentCode.toUpperCase()) {
    context.errors.push(
      problemAt(context, mapping.treatment, `plot ${plot.label} is treatment ${plot.treatmentCode} in the plot plan, not ${treatmentText}.`),
    );
  }
}

/** Finds the row's plot, or says why there is none. */
interface PlotLookup {
  readonly sitePlots: ReadonlyMap<string, SitePlot>;
  readonly trialPlots: IntakeValidationInput['trialPlotLabels'];
  readonly firstRowOf: Map<number, number>;
}

function findPlot(context: RowContext, input: IntakeValidationInput, lookup: PlotLookup): SitePlot | null {
  const column = input.mapping.plotLabel!;
  const label = context.cells[column]!.trim();
  if (label === '') {
    context.errors.push(problemAt(context, column, 'the plot label is empty.'));
    return null;
  }
  const plot = lookup.sitePlots.get(labelKey(label));
  if (!plot) {
    const elsewhere = lookup.trialPlots.get(labelKey(label));
    const message = elsewhere
      ? `plot ${label} belongs to ${elsewhere.siteName}, not ${input.siteName}.`
      : `there is no plot ${label} in this trial; check the label against the plot plan.`;
    context.errors.push(problemAt(context, column, message));
    return null;
  }
  const firstRow = lookup.firstRowOf.get(plot.id);
  if (firstRow !== undefined) {
    context.errors.push(problemAt(context, column, `plot ${plot.label} is also on row ${firstRow}; each plot may appear once in a file.`));
    return null;
  }
  lookup.firstRowOf.set(plot.id, context.row);
  return plot;
}

function readMeasureCells(
  context: RowContext,
  input: IntakeValidationInput,
  plot: SitePlot | null,
  measuresById: ReadonlyMap<number, Measure>,
  out: { values: IntakeValue[]; warnings: IntakeProblem[] },
): void {
  const { mapping, file } = input;
  const textAt = (index: number | null): string | null => {
    const text = index === null ? '' : context.cells[index]!.trim();
    return text === '' ? null : text;
  };
  const notes = textAt(mapping.notes);
  const missingReason = textAt(mapping.missingReason);
  for (const column of mapping.measures) {
    if (column.problems.length > 0) continue;
    const measure = measuresById.get(column.measureId)!;
    const cell = parseCellValue(context.cells[column.index]!, measure, { decimalComma: file.decimalComma, headerUnit: column.headerUnitId });
    if (cell.kind === 'error') {
      context.errors.push(problemAt(context, column.index, cell.message));
      continue;
    }
    if (cell.kind === 'value') out.warnings.push(...cell.warnings.map((warning) => problemAt(context, column.index, warning)));
    if (!plot) continue;
    out.values.push(
      Object.freeze({
        plotId: plot.id,
        plotLabel: plot.label,
        measureId: column.measureId,
        measureCode: column.measureCode,
        valueText: cell.kind === 'value' ? cell.valueText : null,
        censored: cell.kind === 'value' && cell.censored,
        missingReason: cell.kind === 'missing' ? missingReason : null,
        blank: cell.kind === 'missing' && cell.blank,
        notes,
        row: context.row,
      }),
    );
  }
}

function columnWarnings(mapping: ColumnMapping, roundMeasures: readonly Measure[]): IntakeProblem[] {
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

/**
 * Validate intake — checks every row of an uploaded file against the site's plot plan and the
 * round's measures, and lists every problem by row and column.
 *
 * Purpose: the all-or-nothing rule of Intake. Errors: the mapping's problems (no plot label
 * column, units Friable cannot convert, two columns for one measure), an empty or unknown plot
 * label, a plot of another site ("plot QH-B1-P03 belongs to Quarry Hill Garden, not Hollow
 * Lane"), a plot twice in the file (the later row names the earlier one), a block or treatment
 * that disagrees with the plot plan, and every value `parseCellValue` refuses. Warnings: values
 * outside the usual range, more decimals than usual, round measures without a column, columns
 * nothing reads. There is no early exit; each list stops at 500 with a line saying how many
 * more there are.
 *
 * Rows: `row` is the row number a spreadsheet shows for the file, so the header is row 1 and the
 * first data row is row 2 (blank rows count, a quoted line break does not). Columns: the header
 * as written in the file. Messages repeat both: `Row 4, drain time (s): "abc" is not a number.`
 * Plot labels match without regard to case or surrounding spaces.
 * Reference: the Intake issue's list of refusals; values from `parseCellValue`.
 * Throws: nothing; a mapping without a plot label column gives only the mapping's errors.
 * Example: `validateIntake({ file, mapping, sitePlots, trialPlotLabels, roundMeasures, siteName: 'Hollow Lane' }).errors`
 * → `[{ row: 4, column: 'treatment code', message: 'Row 4, treatment code: plot HL-B2-P03 is treatment GYP in the plot plan, not CTRL.' }]`
 */
export function validateIntake(input: IntakeValidationInput): IntakeValidation {
  const { file, mapping, sitePlots, roundMeasures } = input;
  const errors: IntakeProblem[] = [...mapping.problems];
  const out = { values: [] as IntakeValue[], warnings: columnWarnings(mapping, roundMeasures) };
  if (mapping.plotLabel !== null) {
    const lookup: PlotLookup = {
      sitePlots: new Map(sitePlots.map((plot) => [labelKey(plot.label), plot])),
      trialPlots: new Map([...input.trialPlotLabels].map(([label, site]) => [labelKey(label), site])),
      firstRowOf: new Map(),
    };
    const measuresById = new Map(roundMeasures.map((measure) => [measure.id, measure]));
    file.rows.forEach((cells, index) => {
      const context: RowContext = { cells, row: file.rowNumbers[index]!, headers: file.headers, errors };
      const plot = findPlot(context, input, lookup);
      if (plot) checkPlan(context, mapping, plot);
      readMeasureCells(context, input, plot, measuresById, out);
    });
  }
  return Object.freeze({ values: Object.freeze(out.values), errors: capped(errors), warnings: capped(out.warnings) });
}
