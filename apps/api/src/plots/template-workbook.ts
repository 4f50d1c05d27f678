import type { Measure } from '@friable/contracts';
import { findUnit } from '@friable/field';
import ExcelJS from 'exceljs';
import { PassThrough } from 'node:stream';

export interface TemplateTable {
  /** Sheet title: the round's label. */
  readonly sheetName: string;
  /** Plot label, block, plot-unit columns and treatment code: written in, then locked. */
  readonly fixedHeaders: readonly string[];
  readonly fixedRows: ReadonlyArray<readonly (string | number)[]>;
  /** The round's measures, a column each, with their headers ("drain time (s)"). */
  readonly measures: ReadonlyArray<{ readonly measure: Measure; readonly header: string }>;
}

/** Excel's rules for a sheet name: at most 31 characters, none of : \ / ? * [ ]. */
export function sheetNameOf(label: string): string {
  const name = label.replace(/[:\\/?*[\]]+/g, ' ').replace(/\s+/g, ' ').trim().slice(0, 31).trim();
  return name || 'Data';
}

const trimmedText = (cell: string) => `UPPER(TRIM(${cell}))`;

/** The largest value a measure takes as a number: its hard maximum, or for a timed measure the cut-off if lower. */
function upperLimit(measure: Measure): number | null {
  const limits = [measure.hardMax, measure.kind === 'time-with-cutoff' ? measure.cutoff : null, measure.kind === 'score' ? measure.scaleMax : null].filter((value): value is number => value !== null);
  return limits.length ? Math.min(...limits) : null;
}

function lowerLimit(measure: Measure): number | null {
  const limits = [measure.hardMin, measure.kind === 'score' ? measure.scaleMin : null, measure.kind === 'count' ? 0 : null].filter((value): value is number => value !== null);
  return limits.length ? Math.max(...limits) : null;
}

/**
 * The spreadsheet rule for one measure's cells, as a formula on its first cell: a number within
 * what Intake accepts (hard limits, the cut-off, the score scale; whole for counts and scores), or
 * NA, N/A or a dash for a value not recorded, or (a timed measure) ">cut-off" for a plot that had
 * not drained. Values outside the usual range stay allowed: Intake asks about those.
 */
export function measureRule(measure: Measure, cell: string): string {
  const low = lowerLimit(measure);
  const high = upperLimit(measure);
  const number = [`ISNUMBER(${cell})`, ...(low === null ? [] : [`${cell}>=${low}`]), ...(high === null ? [] : [`${cell}<=${high}`]), ...(measure.kind === 'count' || measure.kind === 'score' ? [`INT(${cell})=${cell}`] : [])];
  const missing = [`${trimmedText(cell)}="NA"`, `${trimmedText(cell)}="N/A"`, `TRIM(${cell})="-"`];
  const censored = measure.kind === 'time-with-cutoff' && measure.cutoff !== null ? [`SUBSTITUTE(${cell}," ","")=">${measure.cutoff}"`] : [];
  return `OR(AND(${number.join(',')}),${[...missing, ...censored].join(',')})`;
}

/** What the cell's note and refusal say, in the measure's unit. */
export function measureRuleWords(measure: Measure): string {
  const unit = findUnit(measure.unit)?.symbol ?? measure.unit;
  const suffix = measure.kind === 'score' || measure.kind === 'count' ? '' : ` ${unit}`;
  const low = lowerLimit(measure);
  const high = upperLimit(measure);
  const range = low !== null && high !== null ? ` from ${low} to ${high}${suffix}` : low !== null ? ` of ${low}${suffix} or more` : high !== null ? ` up to ${high}${suffix}` : '';
  const kind = measure.kind === 'count' || measure.kind === 'score' ? 'A whole number' : 'A number';
  const cutoff = measure.kind === 'time-with-cutoff' && measure.cutoff !== null ? `; >${measure.cutoff} if the plot had not drained by the cut-off` : '';
  return `${kind}${range}${cutoff}; NA if it was not recorded.`;
}

const column = (index: number) => {
  let name = '';
  for (let n = index + 1; n > 0; n = Math.floor((n - 1) / 26)) name = String.fromCharCode(65 + ((n - 1) % 26)) + name;
  return name;
};

/**
 * Template workbook — the data sheet of one site and round as an .xlsx workbook: a row per plot
 * with its label, block and treatment written in and locked (sheet protection without a password,
 * so nobody retypes a label by accident), a column per measure open for typing with a rule on its
 * whole range (`measureRule`) and a note saying what it takes, then the reason for a value left NA (Intake asks for one) and notes.
 *
 * Purpose: collaborators who keep their values in a spreadsheet fill in the same sheet Intake
 * reads; the rules catch a typing slip in the spreadsheet already. Written with exceljs's
 * streaming writer, so a site of 100,000 plots costs the file's size in memory, not a workbook model.
 * Reference: ECMA-376 Part 1, §18.3.1.32 (dataValidation) and §18.3.1.85 (sheetProtection).
 * Throws: nothing of its own.
 * Example: `await templateWorkbook({ sheetName: 'Day 0', fixedHeaders: ['plot label', 'block', 'treatment code'], fixedRows, measures })` → the .xlsx bytes
 */
export async function templateWorkbook(table: TemplateTable): Promise<Buffer> {
  const output = new PassThrough();
  const chunks: Buffer[] = [];
  output.on('data', (chunk: Buffer) => chunks.push(chunk));
  const book = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: output, useStyles: true, useSharedStrings: false });
  book.creator = 'Friable';
  const sheet = book.addWorksheet(sheetNameOf(table.sheetName), { views: [{ state: 'frozen', ySplit: 1, xSplit: 1 }] });
  const headers = [...table.fixedHeaders, ...table.measures.map((entry) => entry.header), 'missing reason', 'notes'];
  sheet.columns = headers.map((header, index) => ({
    header,
    width: Math.max(12, Math.min(40, header.length + 2)),
    // Typing goes in the measure, missing reason and notes columns; the plot's own columns stay as the plot plan has them.
    style: index >= table.fixedHeaders.length ? { protection: { locked: false } } : { protection: { locked: true } },
  }));
  sheet.getRow(1).font = { bold: true };
  const last = table.fixedRows.length + 1;
  // exceljs's typings leave out the worksheet's range rules, which its writer has (lib/doc/data-validations.js).
  const rules = (sheet as unknown as { dataValidations: { add(address: string, rule: ExcelJS.DataValidation): void } }).dataValidations;
  table.measures.forEach(({ measure, header }, offset) => {
    const letter = column(table.fixedHeaders.length + offset);
    const words = measureRuleWords(measure);
    rules.add(`${letter}2:${letter}${Math.max(2, last)}`, {
      type: 'custom',
      allowBlank: true,
      formulae: [measureRule(measure, `${letter}2`)],
      showInputMessage: true,
      promptTitle: header.slice(0, 32),
      prompt: words.slice(0, 255),
      showErrorMessage: true,
      errorStyle: 'stop',
      errorTitle: `Not a ${measure.name} value`.slice(0, 32),
      error: words.slice(0, 255),
    });
  });
  for (const cells of table.fixedRows) {
    const row = sheet.addRow([...cells, ...table.measures.map(() => null), null, null]);
    for (let index = table.fixedHeaders.length; index < headers.length; index += 1) row.getCell(index + 1).protection = { locked: false };
    row.commit();
  }
  await sheet.protect('', { selectLockedCells: true, selectUnlockedCells: true, formatColumns: true, formatRows: true, sort: false, autoFilter: true });
  sheet.commit();
  await book.commit();
  return Buffer.concat(chunks);
}
