/** Excel shows numbers to 15 significant digits; a cached result such as 435.00000000000006 reads as 435. */
const SIGNIFICANT_DIGITS = 15;

function numberText(value: number): string | null {
  if (!Number.isFinite(value)) return null;
  return String(Number(value.toPrecision(SIGNIFICANT_DIGITS)));
}

const pad = (value: number, width = 2) => String(value).padStart(width, '0');

/** A date cell as people write it: 2026-05-14, or 2026-05-14 07:30 when it has a time of day. */
function dateText(date: Date): string {
  const day = `${pad(date.getUTCFullYear(), 4)}-${pad(date.getUTCMonth() + 1)}-${pad(date.getUTCDate())}`;
  const seconds = date.getUTCSeconds();
  if (date.getUTCHours() === 0 && date.getUTCMinutes() === 0 && seconds === 0) return day;
  return `${day} ${pad(date.getUTCHours())}:${pad(date.getUTCMinutes())}${seconds ? `:${pad(seconds)}` : ''}`;
}

export type CellReading = { text: string; problem?: undefined } | { text: string; problem: string };

/**
 * Workbook cell text — one spreadsheet cell's typed value (as exceljs reads it) as the text Intake
 * reads from a CSV cell, for the server's reading of a sheet and the browser's preview alike.
 *
 * Purpose: the value the spreadsheet holds, not how it shows it: numbers to 15 significant digits
 * (what a spreadsheet shows at most), dates as 2026-05-14 (with the time of day when there is one),
 * a formula by its saved result, rich text joined, an error value as its text (#DIV/0!).
 * Reference: ECMA-376 Office Open XML, Part 1 (SpreadsheetML); exceljs cell value types,
 * https://github.com/exceljs/exceljs#value-types.
 * Throws nothing: a cell that has no readable value carries a `problem` in words.
 * Example: `workbookCellText({ formula: 'B2*2', result: 25.000000000000004 })` → `{ text: '25' }`
 */
export function workbookCellText(value: unknown): CellReading {
  if (value === null || value === undefined) return { text: '' };
  if (typeof value === 'string') return { text: value };
  if (typeof value === 'number') {
    const text = numberText(value);
    return text === null ? { text: '', problem: 'the cell holds a number the spreadsheet could not compute.' } : { text };
  }
  if (typeof value === 'boolean') return { text: value ? 'TRUE' : 'FALSE' };
  if (value instanceof Date) return { text: dateText(value) };
  if (typeof value === 'object') {
    const cell = value as Record<string, unknown>;
    if ('formula' in cell || 'sharedFormula' in cell) {
      if (cell.result === undefined || cell.result === null) {
        return { text: '', problem: 'a formula without a saved result. Open the file in your spreadsheet program, save it, and upload it again (or type the value).' };
      }
      if (typeof cell.result === 'number' && Number.isNaN(cell.result)) return { text: '', problem: 'a formula whose result is a spreadsheet error.' };
      if (typeof cell.result === 'object' && cell.result !== null && 'error' in cell.result) {
        return { text: String((cell.result as { error: unknown }).error) };
      }
      return workbookCellText(cell.result);
    }
    if (Array.isArray(cell.richText)) return { text: (cell.richText as Array<{ text?: string }>).map((run) => run.text ?? '').join('') };
    if ('error' in cell) return { text: String(cell.error) };
    if ('text' in cell) return workbookCellText(cell.text);
  }
  return { text: String(value) };
}

