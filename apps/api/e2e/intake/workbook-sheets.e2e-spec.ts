import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { buildIntakeTrial, intakePath, rowCounts, storedValues, upload, type IntakeTrial } from './intake-support';

type Cell = ExcelJS.CellValue;

async function workbookOf(build: (book: ExcelJS.Workbook) => void): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  build(book);
  return Buffer.from(await book.xlsx.writeBuffer());
}

/** A sheet as collaborators keep one: a title, a blank row, then the header row (row 3) and the values. */
function addDataSheet(book: ExcelJS.Workbook, name: string, headers: readonly string[], rows: ReadonlyArray<readonly Cell[]>): ExcelJS.Worksheet {
  const sheet = book.addWorksheet(name);
  sheet.getCell('A1').value = `Test Garden, ${name}`;
  sheet.getRow(3).values = [...headers];
  rows.forEach((cells, index) => (sheet.getRow(4 + index).values = [...cells]));
  return sheet;
}

// Workbooks as collaborators send them, built here with exceljs: several sheets, a title above the
// header row, values typed as numbers and dates, formulas, merged cells, units in the headings.
describe('Intake: workbooks with several sheets and typed cells', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let labels: string[];

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
  });
  afterAll(() => t.close());

  const stored = async (plot: string) =>
    (await storedValues(t.sequelize, built.trialId)).filter((value) => value.plot === plot).map(({ measure, valueText, censored, notes }) => ({ measure, valueText, censored, notes }));

  /** Instructions first, then two rounds' sheets: the second holds other values than the first. */
  const twoSheets = () =>
    workbookOf((book) => {
      book.addWorksheet('Instructions').addRow(['Type one value a cell; NA with a reason for a missing one.']);
      addDataSheet(book, 'Week 1', ['plot label', 'drain time (s)'], [[labels[0]!, 111]]);
      addDataSheet(book, 'Week 2', ['plot label', 'drain time (s)', 'notes'], [
        [labels[0]!, 222, 'second sheet'],
        [labels[1]!, 223, null],
      ]);
    });

  it('reads the sheet named in the upload (its tab name, case aside), with the header row found below a title', async () => {
    const response = await upload(t, built.tokens.collaborator, intakePath(built), await twoSheets(), 'weeks.xlsx', { sheet: 'week 2' });
    expect(response.status, JSON.stringify(response.body).slice(0, 400)).toBe(200);
    expect(response.body).toMatchObject({ dryRun: false, created: 2, updated: 0 });
    expect(await stored(labels[0]!)).toEqual([{ measure: 'DT', valueText: '222', censored: 0, notes: 'second sheet' }]);
    expect(await stored(labels[1]!)).toEqual([{ measure: 'DT', valueText: '223', censored: 0, notes: null }]);
  });

  it('refuses a sheet the workbook does not have, naming the sheets it has, and writes nothing', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const response = await upload(t, built.tokens.collaborator, intakePath(built), await twoSheets(), 'weeks.xlsx', { sheet: 'Week 3' });
    expect(response.status).toBe(422);
    expect(response.body.message).toBe('The workbook has no sheet called "Week 3"; its sheets are "Instructions", "Week 1", "Week 2".');
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('without a sheet named reads the first visible one, and when that one holds no values says which other sheets there are', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const response = await upload(t, built.tokens.collaborator, intakePath(built), await twoSheets(), 'weeks.xlsx');
    expect(response.status).toBe(422);
    expect(response.body.message).toBe(
      'The file has a header row but no data rows (read as the sheet "Instructions"). The workbook also has "Week 1", "Week 2": choose the one that holds the values as "Sheet" when you upload.',
    );
    // A first sheet with rows but no plot label column: the same advice beside the missing column.
    const notes = await workbookOf((book) => {
      book.addWorksheet('Notes').addRow(['site', 'weather']);
      book.getWorksheet('Notes')!.addRow(['Test Garden', 'dry']);
      addDataSheet(book, 'Week 1', ['plot label', 'drain time (s)'], [[labels[0]!, 111]]);
    });
    const second = await upload(t, built.tokens.collaborator, intakePath(built), notes, 'notes.xlsx');
    expect(second.status).toBe(422);
    expect(second.body.errors).toEqual(
      expect.arrayContaining([
        { row: null, column: null, message: 'The file has no plot label column: the first column of the template is called "plot label".' },
        { row: null, column: null, message: 'The sheet "Notes" was read. The workbook also has "Week 1": choose the one that holds the values as "Sheet" when you upload.' },
      ]),
    );
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('refuses a sheet name longer than a spreadsheet allows, naming the field', async () => {
    const response = await upload(t, built.tokens.collaborator, intakePath(built), await twoSheets(), 'weeks.xlsx', { sheet: 'x'.repeat(101) });
    expect(response.status).toBe(422);
    expect(JSON.stringify(response.body)).toContain('sheet must be at most 100 characters');
  });

  it('reads numbers as typed (not as shown), dates as dates, formulas by their saved result, and converts a unit in a heading', async () => {
    const bytes = await workbookOf((book) => {
      const sheet = addDataSheet(book, 'Day 0', ['plot label', 'drain time (min)', 'water retained (mL)', 'crumble score', 'notes'], [
        // 2.2 min is 132 s; 150.4 mL is shown as "150" by its number format but typed with its decimal.
        [labels[2]!, 2.2, 150.4, 3, new Date(Date.UTC(2026, 4, 14))],
        // A formula's saved result is read: 100 + 50.5 mL, and 1.5 min (90 s) from =3/2.
        [labels[3]!, { formula: '3/2', result: 1.5 }, { formula: 'SUM(100,50.5)', result: 150.5 }, { formula: 'MAX(2,4)', result: 4 }, 'formulas'],
      ]);
      sheet.getCell('C4').numFmt = '0';
      sheet.getCell('E4').numFmt = 'd mmm yyyy';
    });
    const response = await upload(t, built.tokens.collaborator, intakePath(built), bytes, 'day-0.xlsx');
    expect(response.status, JSON.stringify(response.body).slice(0, 400)).toBe(200);
    expect(response.body).toMatchObject({ created: 6 });
    expect(await stored(labels[2]!)).toEqual([
      { measure: 'CS', valueText: '3', censored: 0, notes: '2026-05-14' },
      { measure: 'DT', valueText: '132', censored: 0, notes: '2026-05-14' },
      { measure: 'WR', valueText: '150.4', censored: 0, notes: '2026-05-14' },
    ]);
    expect(await stored(labels[3]!)).toEqual([
      { measure: 'CS', valueText: '4', censored: 0, notes: 'formulas' },
      { measure: 'DT', valueText: '90', censored: 0, notes: 'formulas' },
      { measure: 'WR', valueText: '150.5', censored: 0, notes: 'formulas' },
    ]);
  });

  it('refuses a formula saved without its result, by the row and column the spreadsheet shows', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const bytes = await workbookOf((book) => {
      addDataSheet(book, 'Day 0', ['plot label', 'water retained (mL)'], [
        [labels[4]!, 120],
        [labels[5]!, { formula: 'B4+1' } as Cell],
      ]);
    });
    const response = await upload(t, built.tokens.collaborator, intakePath(built), bytes, 'unsaved.xlsx');
    expect(response.status).toBe(422);
    expect(response.body.errors).toContainEqual(
      expect.objectContaining({ row: 5, column: 'water retained (mL)', message: expect.stringMatching(/^Row 5, water retained \(mL\): a formula without a saved result/) }),
    );
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('refuses merged cells below the header row in words, by row and column, and writes nothing (a merged title above it is fine)', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const bytes = await workbookOf((book) => {
      const sheet = addDataSheet(book, 'Day 0', ['plot label', 'crumble score', 'notes'], [
        [labels[6]!, 2, 'one score for two plots'],
        [labels[7]!, null, null],
      ]);
      sheet.mergeCells('A1:C1');
      sheet.mergeCells('B4:B5');
    });
    const response = await upload(t, built.tokens.collaborator, intakePath(built), bytes, 'merged.xlsx');
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([
      {
        row: 4,
        column: 'crumble score',
        message: 'Row 4, crumble score: cells B4:B5 are merged. Unmerge them so every row has its own value in its own cell (in your spreadsheet program: select them, then unmerge), then upload the file again.',
      },
    ]);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });
});
