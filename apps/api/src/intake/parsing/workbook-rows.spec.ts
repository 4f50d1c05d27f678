import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { IntakeFileError } from './intake-file.error';
import type { SourceRow } from './table-rows';
import { readWorkbookRows } from './workbook-rows';

async function workbook(build: (book: ExcelJS.Workbook) => void): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  build(book);
  return Buffer.from(await book.xlsx.writeBuffer());
}

async function read(bytes: Buffer, sheet: string | null = null) {
  const rows: SourceRow[] = [];
  const reading = await readWorkbookRows({ bytes }, sheet, (row) => {
    rows.push(row);
  });
  return { rows, ...reading };
}

async function refusal(bytes: Buffer, sheet: string | null = null): Promise<IntakeFileError> {
  try {
    await read(bytes, sheet);
  } catch (error) {
    if (error instanceof IntakeFileError) return error;
    throw error;
  }
  throw new Error('the workbook was accepted');
}

describe('readWorkbookRows', () => {
  it('reads typed values: numbers, text, dates, formulas by their saved result', async () => {
    const bytes = await workbook((book) => {
      const sheet = book.addWorksheet('Day 0');
      sheet.addRow(['plot label', 'drain time (s)', 'sampled on', 'notes']);
      sheet.addRow(['HL-B1-P01', 12.5, new Date(Date.UTC(2026, 4, 14)), 'dry']);
      sheet.addRow(['HL-B1-P02', { formula: 'B2*2', result: 25.000000000000004 }, new Date(Date.UTC(2026, 4, 14, 7, 30)), { richText: [{ text: 'wet ' }, { text: 'crust' }] }]);
      sheet.addRow(['HL-B1-P03', { formula: 'B2/0', result: { error: '#DIV/0!' } }, null, null]);
      sheet.addRow(['HL-B1-P04', { formula: 'B2+1' }, null, true]);
      sheet.getCell('C2').numFmt = 'yyyy-mm-dd';
      sheet.getCell('C3').numFmt = 'yyyy-mm-dd hh:mm';
    });
    const { rows, sheet, merged } = await read(bytes);
    expect(sheet).toBe('Day 0');
    expect(merged).toEqual([]);
    expect(rows.map((row) => row.rowNumber)).toEqual([1, 2, 3, 4, 5]);
    expect(rows[1]!.cells).toEqual(['HL-B1-P01', '12.5', '2026-05-14', 'dry']);
    expect(rows[2]!.cells).toEqual(['HL-B1-P02', '25', '2026-05-14 07:30', 'wet crust']);
    expect(rows[3]!.cells[0]).toBe('HL-B1-P03');
    expect(rows[4]!.cells).toEqual(['HL-B1-P04', '', '', 'TRUE']);
    expect(rows[4]!.cellProblems?.get(1)).toMatch(/^a formula without a saved result/);
  });

  it('reads the first visible sheet, or the one named, and says which sheets there are', async () => {
    const bytes = await workbook((book) => {
      book.addWorksheet('Instructions', { state: 'hidden' }).addRow(['read me']);
      book.addWorksheet('Day 0').addRow(['plot label']);
      book.addWorksheet('Day 14').addRow(['plot label', 'second']);
    });
    const first = await read(bytes);
    expect(first.sheet).toBe('Day 0');
    expect(first.sheets).toEqual([
      { name: 'Instructions', hidden: true },
      { name: 'Day 0', hidden: false },
      { name: 'Day 14', hidden: false },
    ]);
    const named = await read(bytes, ' day 14 ');
    expect(named.sheet).toBe('Day 14');
    expect(named.rows[0]!.cells).toEqual(['plot label', 'second']);
    expect((await refusal(bytes, 'Day 28')).message).toBe('The workbook has no sheet called "Day 28"; its sheets are "Instructions", "Day 0", "Day 14".');
  });

  it('reports merged ranges with their rows and first column', async () => {
    const bytes = await workbook((book) => {
      const sheet = book.addWorksheet('Data');
      sheet.addRow(['Hollow Lane, day 0']);
      sheet.addRow(['plot label', 'block']);
      sheet.addRow(['HL-B1-P01', 1]);
      sheet.addRow(['HL-B1-P02', null]);
      sheet.mergeCells('A1:B1');
      sheet.mergeCells('B3:B4');
    });
    const { merged } = await read(bytes);
    expect(merged).toEqual([
      { ref: 'A1:B1', firstRow: 1, lastRow: 1, firstColumn: 0 },
      { ref: 'B3:B4', firstRow: 3, lastRow: 4, firstColumn: 1 },
    ]);
  });

  it('refuses a zip that is not a workbook, and a damaged file, in words', async () => {
    expect((await refusal(Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00, 0x00]))).message).toMatch(/cannot be opened as one/);
  });
});
