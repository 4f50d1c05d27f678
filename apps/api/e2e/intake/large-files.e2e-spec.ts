import ExcelJS from 'exceljs';
import { randomUUID } from 'node:crypto';
import { PassThrough } from 'node:stream';
import { setTimeout as sleep } from 'node:timers/promises';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectStatus } from '../protocol/protocol-builder';
import { bearer, createTestApp, type TestApp } from '../support/test-app';
import { buildIntakeTrial, upload, type IntakeTrial } from './intake-support';

const ROWS = 50_000;
const PLOTS_PER_BLOCK = 100;
const HEADERS = ['plot label', 'drain time (min)', 'crumble score (score)', 'water retained (mL)', 'missing reason'];
const labelOf = (index: number) => `LF-B${Math.floor(index / PLOTS_PER_BLOCK) + 1}-P${String((index % PLOTS_PER_BLOCK) + 1).padStart(3, '0')}`;

/** A row's cells as typed: drain time in minutes (converted to seconds on the way in), ">10" not drained by the 10-minute cut-off, NA not measured (with its reason). */
function cellsOf(index: number): [string, string | number, number, number, string] {
  const drain = index % 50 === 0 ? '>10' : index % 97 === 0 ? 'NA' : Number(`${1 + (index % 9)}.${1 + (index % 8)}`);
  return [labelOf(index), drain, 1 + (index % 5), Number(`${60 + (index % 300)}.${1 + (index % 9)}`), drain === 'NA' ? 'bed flooded' : ''];
}

function csvOf(cells: (index: number) => ReadonlyArray<string | number>): Buffer {
  const lines = [HEADERS.join(',')];
  for (let index = 0; index < ROWS; index += 1) lines.push(cells(index).join(','));
  return Buffer.from(`${lines.join('\r\n')}\r\n`);
}

/** The same rows as a workbook: numbers as number cells, ">10" and NA as text, as a spreadsheet keeps them. */
async function workbookOf(): Promise<Buffer> {
  const output = new PassThrough();
  const chunks: Buffer[] = [];
  output.on('data', (chunk: Buffer) => chunks.push(chunk));
  const book = new ExcelJS.stream.xlsx.WorkbookWriter({ stream: output, useSharedStrings: true });
  const sheet = book.addWorksheet('Week 4');
  sheet.addRow(HEADERS).commit();
  for (let index = 0; index < ROWS; index += 1) sheet.addRow(cellsOf(index)).commit();
  sheet.commit();
  await book.commit();
  return Buffer.concat(chunks);
}

interface Progress {
  stage: string;
  rowsChecked: number;
}

// Files of 50,000 rows for one site and round, as collaborators of a big trial send them: a CSV
// file and the same rows as a workbook, a file with one bad row, and the import's progress as the
// browser follows it. The big site's plots are written straight into the table (as bench:intake
// does); everything under test goes through the API.
describe('Intake: files of 50,000 rows', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let siteId: number;
  const rounds: Record<'csv' | 'workbook' | 'fresh', number> = { csv: 0, workbook: 0, fresh: 0 };
  const path = (roundId: number) => `/api/trials/${built.trialId}/sites/${siteId}/rounds/${roundId}/intake`;
  const query = <T extends object>(sql: string, replacements: unknown[]) => t.sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });

  /** What a round holds, in a few numbers that change when any value, version or history row does. */
  const fingerprint = async (roundId: number) =>
    (
      await query<object>(
        `SELECT COUNT(*) AS n, SUM(o.version) AS versions, BIT_XOR(CRC32(CONCAT_WS('|', o.plot_id, o.measure_id, o.value_text, o.censored, o.missing_reason, o.version))) AS crc,
                (SELECT COUNT(*) FROM observation_changes c JOIN observations x ON x.id = c.observation_id WHERE x.round_id = ?) AS history
           FROM observations o WHERE o.round_id = ?`,
        [roundId, roundId],
      )
    )[0];

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    const auth = bearer(built.tokens.investigator);
    const base = `/api/trials/${built.trialId}`;
    for (const [key, label, dayOffset] of [['csv', 'Week 2', 14], ['workbook', 'Week 4', 28], ['fresh', 'Week 8', 56]] as const) {
      rounds[key] = (await expectStatus<{ id: number }>(t.http.post(`${base}/rounds`).set(auth).send({ label, dayOffset, measureIds: Object.values(built.measures) }), 201)).id;
    }
    const now = new Date();
    await t.sequelize.query(
      "INSERT INTO sites (trial_id, name, shape, blocks, label_prefix, randomized_at, created_at, updated_at) VALUES (?, 'Long Field', 'rectangle', ?, 'LF', ?, ?, ?)",
      { replacements: [built.trialId, ROWS / PLOTS_PER_BLOCK, now, now, now] },
    );
    siteId = (await query<{ id: number }>("SELECT id FROM sites WHERE trial_id = ? AND label_prefix = 'LF'", [built.trialId]))[0]!.id;
    const treatments = (await query<{ id: number }>('SELECT id FROM treatments WHERE trial_id = ? ORDER BY id', [built.trialId])).map((row) => row.id);
    for (let start = 0; start < ROWS; start += 5000) {
      const values: unknown[] = [];
      for (let index = start; index < start + 5000; index += 1) {
        values.push(built.trialId, siteId, Math.floor(index / PLOTS_PER_BLOCK) + 1, (index % PLOTS_PER_BLOCK) + 1, treatments[index % treatments.length], labelOf(index), now, now);
      }
      await t.sequelize.query(`INSERT INTO plots (trial_id, site_id, block, position, treatment_id, label, created_at, updated_at) VALUES ${'(?,?,?,?,?,?,?,?),'.repeat(5000).slice(0, -1)}`, { replacements: values });
    }
  }, 300_000);
  afterAll(() => t.close());

  it('commits a 50,000-row CSV file and the same rows as a workbook with identical results, following the CSV’s progress in order', async () => {
    const csv = csvOf(cellsOf);
    const ticket = randomUUID();
    const seen: Progress[] = [];
    let uploading = true;
    const follow = (async () => {
      while (uploading) {
        const response = await t.http.get(`/api/trials/${built.trialId}/intake-imports/${ticket}`).set(bearer(built.tokens.investigator));
        if (response.status === 200) seen.push({ stage: response.body.stage, rowsChecked: response.body.rowsChecked });
        await sleep(20);
      }
    })();
    const fromCsv = await Promise.resolve(upload(t, built.tokens.investigator, path(rounds.csv), csv, 'week-2.csv', { ticket })).finally(() => (uploading = false));
    await follow;
    expect(fromCsv.status, JSON.stringify(fromCsv.body).slice(0, 500)).toBe(200);

    const fromWorkbook = await upload(t, built.tokens.investigator, path(rounds.workbook), await workbookOf(), 'week-4.xlsx');
    expect(fromWorkbook.status, JSON.stringify(fromWorkbook.body).slice(0, 500)).toBe(200);

    // Three measures a row, every cell written (NA as a value not recorded).
    expect(fromCsv.body).toMatchObject({ dryRun: false, created: ROWS * 3, updated: 0, unchanged: 0, identicalToPrevious: false });
    const { message: csvMessage, ticket: csvTicket, ...csvAnswer } = fromCsv.body;
    const { message: workbookMessage, ticket: workbookTicket, ...workbookAnswer } = fromWorkbook.body;
    expect(workbookAnswer).toEqual(csvAnswer);
    expect(csvMessage.replace('week-2.csv', 'FILE').replace('Week 2', 'ROUND')).toBe(workbookMessage.replace('week-4.xlsx', 'FILE').replace('Week 4', 'ROUND'));
    expect(csvTicket).toBe(ticket);
    expect(workbookTicket).not.toBe(ticket);

    // Value for value the same, and each with its first history row.
    const [{ same }] = await query<{ same: number }>(
      `SELECT COUNT(*) AS same FROM observations a JOIN observations b ON b.plot_id = a.plot_id AND b.measure_id = a.measure_id AND b.round_id = ?
        WHERE a.round_id = ? AND a.value_text <=> b.value_text AND a.value_decimal <=> b.value_decimal AND a.censored = b.censored AND a.missing_reason <=> b.missing_reason`,
      [rounds.workbook, rounds.csv],
    );
    expect(Number(same)).toBe(ROWS * 3);
    for (const roundId of [rounds.csv, rounds.workbook]) expect(await fingerprint(roundId)).toMatchObject({ n: ROWS * 3, history: ROWS * 3 });
    const firstRows = await query<{ label: string; code: string; valueText: string | null; censored: number; missingReason: string | null }>(
      `SELECT p.label, m.code, o.value_text AS valueText, o.censored, o.missing_reason AS missingReason FROM observations o JOIN plots p ON p.id = o.plot_id JOIN measures m ON m.id = o.measure_id
        WHERE o.round_id = ? AND p.label IN ('LF-B1-P001', 'LF-B1-P002', 'LF-B1-P098') ORDER BY p.label, m.code`,
      [rounds.workbook],
    );
    // Row 1: ">10" min is not drained by the 600 s cut-off; row 2: 2.2 min is 132 s; row 98 (index 97): NA, with its reason.
    expect(firstRows).toEqual([
      { label: 'LF-B1-P001', code: 'CS', valueText: '1', censored: 0, missingReason: null },
      { label: 'LF-B1-P001', code: 'DT', valueText: '600', censored: 1, missingReason: null },
      { label: 'LF-B1-P001', code: 'WR', valueText: '60.1', censored: 0, missingReason: null },
      { label: 'LF-B1-P002', code: 'CS', valueText: '2', censored: 0, missingReason: null },
      { label: 'LF-B1-P002', code: 'DT', valueText: '132', censored: 0, missingReason: null },
      { label: 'LF-B1-P002', code: 'WR', valueText: '61.2', censored: 0, missingReason: null },
      { label: 'LF-B1-P098', code: 'CS', valueText: '3', censored: 0, missingReason: null },
      { label: 'LF-B1-P098', code: 'DT', valueText: null, censored: 0, missingReason: 'bed flooded' },
      { label: 'LF-B1-P098', code: 'WR', valueText: '157.8', censored: 0, missingReason: null },
    ]);

    // The progress the browser follows: the stages in their order, the rows checked only growing, and the answer at the end.
    const order = ['checking', 'comparing', 'writing', 'done'];
    const stages = seen.map((entry) => entry.stage).filter((stage, index, all) => index === 0 || all[index - 1] !== stage);
    expect(stages[0]).toBe('checking');
    expect(stages.every((stage) => order.includes(stage))).toBe(true);
    expect(stages.map((stage) => order.indexOf(stage))).toEqual([...stages.map((stage) => order.indexOf(stage))].sort((a, b) => a - b));
    const checked = seen.map((entry) => entry.rowsChecked);
    expect(checked).toEqual([...checked].sort((a, b) => a - b));
    const final = await t.http.get(`/api/trials/${built.trialId}/intake-imports/${ticket}`).set(bearer(built.tokens.investigator));
    expect(final.body).toMatchObject({ stage: 'done', rowsChecked: ROWS, valuesDone: ROWS * 3, result: csvAnswer });
  }, 600_000);

  it('refuses a 50,000-row file with one bad row near its end, naming it, and leaves the stored values and a fresh round untouched', async () => {
    const before = await fingerprint(rounds.csv);
    const [{ uploads }] = await query<{ uploads: number }>('SELECT COUNT(*) AS uploads FROM intake_uploads WHERE trial_id = ?', [built.trialId]);
    // Every water value changed, and row 49,999 (index 49,997) holds a word.
    const changed = csvOf((index) => {
      const cells = cellsOf(index);
      return index === 49_997 ? [cells[0], cells[1], cells[2], 'about 80', cells[4]] : [cells[0], cells[1], cells[2], Number(cells[3]) + 1, cells[4]];
    });
    for (const roundId of [rounds.csv, rounds.fresh]) {
      const response = await upload(t, built.tokens.investigator, path(roundId), changed, 'changed.csv');
      expect(response.status).toBe(422);
      expect(response.body.message).toBe('Nothing was written: the file has 1 problem in 1 row. Correct them and upload the whole file again.');
      expect(response.body.errors).toEqual([{ row: 49_999, column: 'water retained (mL)', message: 'Row 49999, water retained (mL): "about 80" is not a number.' }]);
    }
    expect(await fingerprint(rounds.csv)).toEqual(before);
    expect(await fingerprint(rounds.fresh)).toMatchObject({ n: 0, history: 0 });
    const [{ after }] = await query<{ after: number }>('SELECT COUNT(*) AS after FROM intake_uploads WHERE trial_id = ?', [built.trialId]);
    expect(Number(after)).toBe(Number(uploads));
  }, 600_000);
});
