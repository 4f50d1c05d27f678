import { EXPORT_CSV_COLUMNS, type Measure, type Observation, type TrialDetail } from '@friable/contracts';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, binaryBody, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

const parseCsv = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });

describe('Exports: tidy CSV with its dictionary, and the workbook', () => {
  let t: TestApp;
  let demoBase: string;
  let demoToken: string;
  let built: IntakeTrial;
  let base: string;

  const expectRowMatches = (row: Record<string, string>, o: Observation, trialCode: string, measures: Measure[]) => {
    expect(row).toEqual({
      trial: trialCode,
      site: o.siteName,
      block: String(o.block),
      plot_label: o.plotLabel,
      treatment: o.treatmentCode,
      round: o.roundLabel,
      measure: o.measureCode,
      unit: measures.find((m) => m.id === o.measureId)!.unit,
      value: o.valueText ?? '',
      censored: String(o.censored),
      censor_limit: o.censored ? o.valueText : '',
      missing_reason: o.missingReason ?? '',
      notes: o.notes === null ? '' : /^[=+\-@]/.test(o.notes) ? `'${o.notes}` : o.notes,
      recorded_by: o.recordedBy ?? '',
      recorded_at: o.recordedAt,
    });
  };

  beforeAll(async () => {
    t = await createTestApp();
    const trial = await Trial.findOne({ where: { code: 'FW-CLAY-26' } });
    const reviewer = await createPerson({ name: 'Export reviewer' });
    await TrialMembership.create({ trialId: trial!.id, userId: reviewer.id, role: 'reviewer', siteId: null });
    demoToken = await tokenFor(t, reviewer);
    demoBase = `/api/trials/${trial!.id}`;

    built = await buildIntakeTrial(t);
    base = `/api/trials/${built.trialId}`;
    const labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
    const csv = `plot label,water retained (mL),drain time (s)\n${labels.map((label, i) => `${label},${100 + i * 7}.5,${i === 0 ? '>600' : `${40 + i}`}`).join('\n')}\n`;
    const response = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
    if (response.status !== 200) throw new Error(JSON.stringify(response.body));
    const cell = ((await t.http.get(`${base}/observations?measureId=${built.measures.WR}`).set(bearer(built.tokens.investigator))).body as Observation[])[0]!;
    const noted = await t.http.patch(`${base}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: cell.version, value: cell.valueText, notes: '=1+1' });
    if (noted.status !== 200) throw new Error(JSON.stringify(noted.body));
  });
  afterAll(() => t.close());

  it('exports every demo observation as one tidy CSV row, value by value as GET /observations', async () => {
    const response = await t.http.get(`${demoBase}/export.csv`).set(bearer(demoToken));
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(response.headers['content-disposition']).toBe('attachment; filename="FW-CLAY-26-observations.csv"');
    const parsed = parseCsv(response.text);
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...EXPORT_CSV_COLUMNS]);
    const observations = (await t.http.get(`${demoBase}/observations`).set(bearer(demoToken))).body as Observation[];
    const protocol = (await t.http.get(demoBase).set(bearer(demoToken))).body as TrialDetail;
    expect(parsed.data).toHaveLength(observations.length);
    expect(observations.some((o) => o.censored) && observations.some((o) => o.missingReason !== null)).toBe(true);
    parsed.data.forEach((row, i) => expectRowMatches(row, observations[i]!, 'FW-CLAY-26', protocol.measures));

    const dictionary = await t.http.get(`${demoBase}/export-dictionary.csv`).set(bearer(demoToken));
    expect(dictionary.status).toBe(200);
    const entries = parseCsv(dictionary.text);
    expect(entries.meta.fields).toEqual(['column', 'meaning', 'type']);
    expect(entries.data.map((d) => d.column)).toEqual([...EXPORT_CSV_COLUMNS]);
    expect(entries.data.every((d) => d.meaning!.length > 10)).toBe(true);
  });

  it('neutralises formulas in text cells: a note "=1+1" comes out as "\'=1+1"', async () => {
    const response = await t.http.get(`${base}/export.csv`).set(bearer(built.tokens.reviewer));
    const rows = parseCsv(response.text).data;
    const noted = rows.filter((r) => r.notes !== '');
    expect(noted).toHaveLength(1);
    expect(noted[0]!.notes).toBe("'=1+1");
    expect(rows.find((r) => r.censored === 'true')).toMatchObject({ measure: 'DT', value: '600', censor_limit: '600' });
    expect((await t.http.get(`${base}/export.csv`).set(bearer(built.tokens.nonMember))).status).toBe(404);
  });

  it('writes a workbook with the protocol, plot plans, data, dictionary and each saved analysis', async () => {
    const snapshot = await t.http
      .post(`${base}/analyses`)
      .set(bearer(built.tokens.investigator))
      .send({ measureId: built.measures.WR, roundId: built.roundId, siteId: built.siteId, title: '=HYPERLINK("x") water' });
    expect(snapshot.status).toBe(201);
    const response = await t.http.get(`${base}/export.xlsx`).set(bearer(built.tokens.collaborator)).buffer(true).parse(binaryBody);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(response.body as Buffer);
    expect(book.worksheets.map((s) => s.name)).toEqual(['Protocol', 'Plot plans', 'Data', 'Dictionary', `Analysis ${snapshot.body.id}`]);

    const observations = (await t.http.get(`${base}/observations`).set(bearer(built.tokens.investigator))).body as Observation[];
    const data = book.getWorksheet('Data')!;
    const header = (data.getRow(1).values as unknown[]).slice(1);
    expect(header).toEqual([...EXPORT_CSV_COLUMNS]);
    const column = (name: string) => header.indexOf(name) + 1;
    observations.forEach((o, i) => {
      const row = data.getRow(i + 2);
      expect(row.getCell(column('plot_label')).value).toBe(o.plotLabel);
      expect(row.getCell(column('measure')).value).toBe(o.measureCode);
      expect(row.getCell(column('block')).value).toBe(o.block);
      expect(row.getCell(column('value')).value).toBe(o.valueNumber);
      expect(row.getCell(column('censored')).value).toBe(o.censored);
      expect(row.getCell(column('notes')).value ?? '').toBe(o.notes === '=1+1' ? "'=1+1" : (o.notes ?? ''));
    });
    expect(data.getRow(observations.length + 2).getCell(1).value ?? null).toBeNull();

    const plans = book.getWorksheet('Plot plans')!;
    const planLabels: unknown[] = [];
    plans.eachRow((row, index) => void (index > 1 && planLabels.push(row.getCell(4).value)));
    expect(planLabels.sort()).toEqual(Object.keys(built.plots).sort());
    const protocolSheet = book.getWorksheet('Protocol')!;
    expect(protocolSheet.getRow(1).values).toEqual([undefined, 'field', 'value']);
    const analysis = book.getWorksheet(`Analysis ${snapshot.body.id}`)!;
    expect(analysis.getRow(2).values).toEqual([undefined, 'title', '\'=HYPERLINK("x") water']);
    const texts: string[] = [];
    book.eachSheet((sheet) => sheet.eachRow((row) => row.eachCell((cell) => void (typeof cell.value === 'string' && texts.push(cell.value)))));
    expect(texts.filter((text) => /^[=+\-@]/.test(text))).toEqual([]);
    expect(book.worksheets.every((sheet) => { let formulas = 0; sheet.eachRow((row) => row.eachCell((cell) => void (cell.type === ExcelJS.ValueType.Formula && formulas++))); return formulas === 0; })).toBe(true);
  });
});
