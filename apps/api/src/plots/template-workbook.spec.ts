import type { Measure } from '@friable/contracts';
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { measureRule, measureRuleWords, sheetNameOf, templateWorkbook } from './template-workbook';

const measure = (fields: Partial<Measure>): Measure => ({
  id: 1,
  version: 1,
  code: 'M',
  name: 'measure',
  unit: 's',
  kind: 'continuous',
  scaleMin: null,
  scaleMax: null,
  cutoff: null,
  plausibleMin: null,
  plausibleMax: null,
  hardMin: null,
  hardMax: null,
  decimals: 0,
  higherIsBetter: true,
  position: 0,
  ...fields,
});

const drain = measure({ code: 'DT', name: 'drain time', kind: 'time-with-cutoff', cutoff: 600, hardMin: 0, hardMax: 3600, plausibleMin: 5, plausibleMax: 600 });
const crumble = measure({ code: 'CS', name: 'crumble score', unit: 'score', kind: 'score', scaleMin: 1, scaleMax: 5 });

describe('the data sheet as a workbook', () => {
  it('writes each measure’s rule as a formula on its first cell: limits, whole numbers, NA and >cut-off', () => {
    expect(measureRule(drain, 'E2')).toBe('OR(AND(ISNUMBER(E2),E2>=0,E2<=600),UPPER(TRIM(E2))="NA",UPPER(TRIM(E2))="N/A",TRIM(E2)="-",SUBSTITUTE(E2," ","")=">600")');
    expect(measureRule(crumble, 'F2')).toBe('OR(AND(ISNUMBER(F2),F2>=1,F2<=5,INT(F2)=F2),UPPER(TRIM(F2))="NA",UPPER(TRIM(F2))="N/A",TRIM(F2)="-")');
    expect(measureRuleWords(drain)).toBe('A number from 0 to 600 s; >600 if the plot had not drained by the cut-off; NA if it was not recorded.');
    expect(measureRuleWords(crumble)).toBe('A whole number from 1 to 5; NA if it was not recorded.');
    expect(measureRuleWords(measure({ unit: 'g' }))).toBe('A number; NA if it was not recorded.');
  });

  it('names the sheet as Excel allows', () => {
    expect(sheetNameOf('Week 2: after rain [wet]')).toBe('Week 2 after rain wet');
    expect(sheetNameOf('Assessment round with a very long label indeed')).toBe('Assessment round with a very lo');
  });

  it('locks the plots’ columns, leaves the measures and notes open and puts a rule on each measure’s range', async () => {
    const bytes = await templateWorkbook({
      sheetName: 'Day 0',
      fixedHeaders: ['plot label', 'block', 'treatment code'],
      fixedRows: [
        ['HL-B1-P01', 1, 'C'],
        ['HL-B1-P02', 1, 'G'],
      ],
      measures: [
        { measure: drain, header: 'drain time (s)' },
        { measure: crumble, header: 'crumble score (score)' },
      ],
    });
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(bytes as unknown as ArrayBuffer);
    const sheet = book.getWorksheet('Day 0')!;
    expect(sheet.getRow(1).values).toEqual([undefined, 'plot label', 'block', 'treatment code', 'drain time (s)', 'crumble score (score)', 'missing reason', 'notes']);
    expect(sheet.getRow(3).values).toEqual([undefined, 'HL-B1-P02', 1, 'G']);
    expect((sheet as unknown as { sheetProtection: { sheet: boolean } | null }).sheetProtection?.sheet).toBe(true);
    expect(sheet.getCell('A2').protection?.locked).not.toBe(false);
    expect(sheet.getCell('C3').protection?.locked).not.toBe(false);
    for (const address of ['D2', 'E3', 'F2']) expect(sheet.getCell(address).protection?.locked, address).toBe(false);
    const rules = (sheet as unknown as { dataValidations: { model: Record<string, ExcelJS.DataValidation & { formulae: string[] }> } }).dataValidations.model;
    const drainRule = Object.entries(rules).find(([address]) => address.startsWith('D'))![1];
    expect(drainRule.type).toBe('custom');
    expect(drainRule.formulae[0]).toBe(measureRule(drain, 'D2'));
    expect(Object.keys(rules).filter((address) => address.startsWith('E')).length).toBeGreaterThan(0);
    expect(Object.keys(rules).some((address) => /^[ABC]/.test(address))).toBe(false);
  });
});
