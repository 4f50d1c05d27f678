import { describe, expect, it } from 'vitest';
import { workbookCellText } from './workbook-cell-text';

// Cell values as exceljs hands them over (its documented value types), read as the text of a CSV cell.
describe('workbookCellText', () => {
  it('turns each kind of cell value into text', () => {
    expect(workbookCellText(0.1 + 0.2)).toEqual({ text: '0.3' });
    expect(workbookCellText(1e-7)).toEqual({ text: '1e-7' });
    expect(workbookCellText({ text: 'link', hyperlink: 'http://example.org' })).toEqual({ text: 'link' });
    expect(workbookCellText({ error: '#N/A' })).toEqual({ text: '#N/A' });
    expect(workbookCellText({ sharedFormula: 'B2', result: 'text result' })).toEqual({ text: 'text result' });
    expect(workbookCellText(Number.NaN).problem).toMatch(/could not compute/);
    // A spreadsheet saves an error result as <v>#DIV/0!</v>; the streaming reader turns it into NaN.
    expect(workbookCellText({ formula: 'B2/0', result: Number.NaN }).problem).toBe('a formula whose result is a spreadsheet error.');
  });

  it('reads dates as ISO dates, with the time of day only when there is one', () => {
    expect(workbookCellText(new Date(Date.UTC(2026, 4, 14)))).toEqual({ text: '2026-05-14' });
    expect(workbookCellText(new Date(Date.UTC(2026, 4, 14, 7, 30)))).toEqual({ text: '2026-05-14 07:30' });
    expect(workbookCellText({ richText: [{ text: 'wet ' }, { text: 'crust' }] })).toEqual({ text: 'wet crust' });
    expect(workbookCellText({ formula: 'B2' }).problem).toMatch(/^a formula without a saved result/);
  });
});
