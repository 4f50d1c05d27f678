import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, binaryBody, createTestApp, type TestApp } from '../support/test-app';
import { buildIntakeTrial, intakePath, storedValues, upload, type IntakeTrial } from './intake-support';

describe('Intake: the data sheet as a workbook', () => {
  let t: TestApp;
  let built: IntakeTrial;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  it('downloads the site and round’s workbook: plots written in and locked, each measure’s cells under a rule, and takes it back filled in', async () => {
    const response = await t.http
      .get(`/api/trials/${built.trialId}/sites/${built.siteId}/rounds/${built.roundId}/template.xlsx`)
      .set(bearer(built.tokens.collaborator))
      .buffer(true)
      .parse(binaryBody);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    expect(response.headers['content-disposition']).toMatch(/^attachment; filename="IN-[A-Z0-9-]+-TG-Day-0\.xlsx"$/);

    const book = new ExcelJS.Workbook();
    await book.xlsx.load(response.body as ArrayBuffer);
    const sheet = book.worksheets[0]!;
    expect(sheet.name).toBe('Day 0');
    const headers = (sheet.getRow(1).values as unknown[]).slice(1);
    expect(headers).toEqual(['plot label', 'block', 'treatment code', 'drain time (s)', 'crumble score (score)', 'water retained (mL)', 'missing reason', 'notes']);
    const labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
    expect(sheet.rowCount).toBe(labels.length + 1);
    expect((sheet as unknown as { sheetProtection: { sheet: boolean } | null }).sheetProtection?.sheet).toBe(true);
    expect(sheet.getCell('A2').protection?.locked).not.toBe(false);
    expect(sheet.getCell('D2').protection?.locked).toBe(false);
    const rules = Object.entries((sheet as unknown as { dataValidations: { model: Record<string, { type: string; formulae: string[] }> } }).dataValidations.model);
    // drain time: 0 to the 600 s cut-off, NA or >600; crumble score whole from 1 to 5; water retained 0 to 1000 mL.
    expect(rules.find(([address]) => address === 'D2')![1].formulae[0]).toBe('OR(AND(ISNUMBER(D2),D2>=0,D2<=600),UPPER(TRIM(D2))="NA",UPPER(TRIM(D2))="N/A",TRIM(D2)="-",SUBSTITUTE(D2," ","")=">600")');
    expect(rules.find(([address]) => address === 'E2')![1].formulae[0]).toContain('E2>=1,E2<=5,INT(E2)=E2');
    expect(rules.find(([address]) => address === 'F2')![1].formulae[0]).toContain('F2>=0,F2<=1000');

    // A collaborator types the values in, as numbers, with one plot not drained by the cut-off.
    for (let row = 2; row <= sheet.rowCount; row += 1) {
      sheet.getCell(`D${row}`).value = row === 2 ? '>600' : 100 + row;
      sheet.getCell(`E${row}`).value = 1 + (row % 5);
      sheet.getCell(`F${row}`).value = 150.5;
    }
    const filled = Buffer.from(await book.xlsx.writeBuffer());
    const committed = await upload(t, built.tokens.collaborator, intakePath(built), filled, 'Day 0.xlsx');
    expect(committed.status, JSON.stringify(committed.body).slice(0, 400)).toBe(200);
    expect(committed.body).toMatchObject({ created: labels.length * 3, updated: 0, warnings: [] });
    const stored = (await storedValues(t.sequelize, built.trialId)).filter((value) => value.plot === sheet.getCell('A2').value);
    expect(stored.map(({ measure, valueText, censored }) => ({ measure, valueText, censored }))).toEqual([
      { measure: 'CS', valueText: '3', censored: 0 },
      { measure: 'DT', valueText: '600', censored: 1 },
      { measure: 'WR', valueText: '150.5', censored: 0 },
    ]);
  });
});
