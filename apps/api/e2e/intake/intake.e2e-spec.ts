import type { IntakeResult } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createTestApp, type TestApp, patchCurrent } from '../support/test-app';
import { waitForMessages } from '../team/team-support';
import { buildIntakeTrial, fixture, intakePath, rowCounts, storedValues, upload, type IntakeTrial } from './intake-support';

describe('Intake: CSV upload of one site and round', () => {
  let t: TestApp;
  let built: IntakeTrial;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  describe('refuses every class of bad input with 422, by row and column, writing nothing', () => {
    const cases: Array<{ file: string; row: number | null; column: string | null; message: RegExp }> = [
      { file: 'unknown-plot.csv', row: 3, column: 'plot label', message: /^Row 3, plot label: there is no plot TG-B9-P01 in this trial/ },
      { file: 'other-site-plot.csv', row: 3, column: 'plot label', message: /^Row 3, plot label: plot OG-B1-P01 belongs to Other Garden, not Test Garden\.$/ },
      { file: 'not-a-number.csv', row: 3, column: 'drain time (s)', message: /^Row 3, drain time \(s\): "abc" is not a number\.$/ },
      { file: 'hard-limit.csv', row: 2, column: 'water retained (mL)', message: /1500 mL is impossible for water retained, which must be 0 to 1000 mL/ },
      { file: 'score-off-scale.csv', row: 2, column: 'crumble score', message: /7 is not on the scale: crumble score is scored on the 1 to 5 scale/ },
      { file: 'plot-twice.csv', row: 4, column: 'plot label', message: /plot TG-B1-P01 is also on row 2; each plot may appear once/ },
      { file: 'no-plot-column.csv', row: null, column: null, message: /no plot label column/ },
      { file: 'unbalanced-quotes.csv', row: 2, column: null, message: /^Row 2: a quoted field is not closed/ },
      { file: 'binary-junk.bin', row: null, column: null, message: /binary data|not UTF-8 text/ },
      { file: 'empty.csv', row: null, column: null, message: /^The file is empty\.$/ },
      { file: 'workbook.xlsx', row: null, column: null, message: /^The workbook has no sheets\.$/ },
      { file: 'formula-value.csv', row: 2, column: 'drain time (s)', message: /"=1\+1" looks like a spreadsheet formula; not a number/ },
    ];

    it.each(cases)('$file', async ({ file, row, column, message }) => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const response = await upload(t, built.tokens.investigator, intakePath(built), fixture(file), file);
      expect(response.status).toBe(422);
      expect(response.body.message).toMatch(/^Nothing was written|^The file|^The workbook|^Row|^This is/);
      const problem = (response.body.errors as Array<{ row: number | null; column: string | null; message: string }>).find((e) => message.test(e.message));
      expect(problem, JSON.stringify(response.body.errors)).toMatchObject({ row, column });
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    });

    it('a single line of 1 MB (made here: one cell far over the 10,000-character limit)', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const bytes = Buffer.from(`plot label,drain time (s),notes\nTG-B1-P01,12,${'x'.repeat(1_048_576)}\n`);
      const response = await upload(t, built.tokens.investigator, intakePath(built), bytes);
      expect(response.status).toBe(422);
      expect(response.body.message).toMatch(/^Row 2, column 3: a cell of 1,048,576 characters; cells of up to 10000 are accepted/);
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    });

    it('a request without a file', async () => {
      const response = await t.http.post(intakePath(built)).set(bearer(built.tokens.investigator)).field('acceptWarnings', 'true');
      expect(response.status).toBe(422);
      expect(response.body.message).toMatch(/form field "file"/);
    });
  });

  it('lists every problem of a file, not only the first, and keeps it all-or-nothing', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const bytes = Buffer.from('plot label,drain time (s),crumble score\nTG-B1-P01,12,3\nTG-B1-P02,abc,9\nTG-B9-P09,1,1\n');
    const response = await upload(t, built.tokens.investigator, intakePath(built), bytes);
    expect(response.status).toBe(422);
    expect(response.body.message).toBe('Nothing was written: the file has 3 problems in 2 rows. Correct them and upload the whole file again.');
    expect(response.body.errors.map((e: { row: number; column: string }) => [e.row, e.column])).toEqual([
      [3, 'drain time (s)'],
      [3, 'crumble score'],
      [4, 'plot label'],
    ]);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('writes values outside the usual range only when the uploader accepts the warnings', async () => {
    const path = intakePath(built, built.otherSiteId);
    const bytes = Buffer.from('plot label,drain time (s),crumble score,water retained (mL)\nOG-B1-P01,14,3,450\nOG-B1-P02,3,2,120\n');
    const before = await rowCounts(t.sequelize, built.trialId);
    const refused = await upload(t, built.tokens.investigator, path, bytes);
    expect(refused.status).toBe(422);
    expect(refused.body.message).toMatch(/^Nothing was written: 2 warnings need your decision\..*if they are right, confirm them/);
    expect(refused.body.errors.map((e: { message: string }) => e.message)).toEqual([
      'Row 2, water retained (mL): 450 mL is outside the usual range of water retained (50 to 400 mL): check it, then accept the warning to keep it.',
      'Row 3, drain time (s): 3 s is outside the usual range of drain time (5 to 600 s): check it, then accept the warning to keep it.',
    ]);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);

    const accepted = await upload(t, built.tokens.investigator, path, bytes, 'warned.csv', { acceptWarnings: 'true' });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ dryRun: false, created: 6, updated: 0, unchanged: 0 });
    expect(accepted.body.warnings).toHaveLength(2);
    const stored = (await storedValues(t.sequelize, built.trialId)).filter((v) => v.plot.startsWith('OG-'));
    expect(stored.find((v) => v.plot === 'OG-B1-P01' && v.measure === 'WR')).toMatchObject({ valueText: '450', source: 'upload', version: 1 });

    const viaQuery = await upload(t, built.tokens.investigator, intakePath(built, built.otherSiteId, '?acceptWarnings=true'), Buffer.from(bytes.toString().replace('450', '451')));
    expect(viaQuery.status).toBe(200);
    expect(viaQuery.body).toMatchObject({ created: 0, updated: 1, unchanged: 5 });
  });

  describe('commit, dry run, identical re-upload and replacement on Test Garden', () => {
    let first: IntakeResult;

    it('a dry run says what would happen and writes nothing', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const response = await upload(t, built.tokens.collaborator, intakePath(built, built.siteId, '?dryRun=true'), fixture('good.csv'), 'good.csv');
      expect(response.status).toBe(200);
      // 9 plots × 3 measures; the empty missing-reason and notes cells are not values.
      expect(response.body).toMatchObject({ dryRun: true, created: 27, updated: 0, unchanged: 0, identicalToPrevious: false, warnings: [] });
      expect(response.body.changes[0]).toEqual({ plotLabel: 'TG-B1-P01', measureCode: 'DT', kind: 'new', before: null, after: '12.50' });
      expect(response.body.message).toMatch(/^Nothing was written \(dry run\)\. Committing would add 27 new values/);
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    });

    it('commits the whole file in one go, values stored exactly as typed with the censoring flag', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const response = await upload(t, built.tokens.collaborator, intakePath(built), fixture('good.csv'), 'good.csv');
      expect(response.status).toBe(200);
      first = response.body;
      expect(first).toMatchObject({ dryRun: false, created: 27, updated: 0, unchanged: 0, identicalToPrevious: false });
      expect(first.message).toBe('Saved good.csv for Test Garden, Day 0: 27 new values, 0 changed, 0 unchanged.');
      const after = await rowCounts(t.sequelize, built.trialId);
      expect(after).toEqual({ ...before, observations: before.observations + 27, changes: before.changes + 27, uploads: before.uploads + 1, activity: before.activity + 1 });
      const stored = (await storedValues(t.sequelize, built.trialId)).filter((v) => v.plot.startsWith('TG-'));
      const cell = (plot: string, measure: string) => stored.find((v) => v.plot === plot && v.measure === measure);
      expect(cell('TG-B1-P01', 'DT')).toMatchObject({ valueText: '12.50', valueDecimal: '12.5000000000', censored: 0 });
      expect(cell('TG-B1-P02', 'DT')).toMatchObject({ valueText: '600', censored: 1, notes: 'not drained at the cut-off' });
      expect(cell('TG-B1-P03', 'WR')).toMatchObject({ valueText: null, valueDecimal: null, missingReason: 'bed flooded' });
      expect(cell('TG-B2-P02', 'DT')).toMatchObject({ valueText: '33' });
      expect(cell('TG-B2-P03', 'WR')).toMatchObject({ valueText: '88.5' });
    });

    it('sends the uploader a receipt through the SMTP sink', async () => {
      const [receipt] = await waitForMessages(built.emails.collaborator);
      expect(receipt!.subject).toMatch(/^Received: IN-[A-Z0-9]+, Test Garden, Day 0$/);
      expect(receipt!.text).toContain('your file good.csv (9 rows) was saved for Test Garden, Day 0');
      expect(receipt!.text).toContain('- 27 new values');
    });

    it('a byte-identical re-upload changes nothing and says so', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const versions = (await storedValues(t.sequelize, built.trialId)).map((v) => v.version);
      const dry = await upload(t, built.tokens.collaborator, intakePath(built, built.siteId, '?dryRun=true'), fixture('good.csv'), 'again.csv');
      expect(dry.body).toMatchObject({ dryRun: true, identicalToPrevious: true, created: 0, updated: 0, unchanged: 27 });
      const response = await upload(t, built.tokens.collaborator, intakePath(built), fixture('good.csv'), 'again.csv');
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ dryRun: false, identicalToPrevious: true, created: 0, updated: 0, unchanged: 27, changes: [] });
      expect(response.body.message).toMatch(/^This file is byte for byte the one committed for Test Garden, Day 0 on \d{4}-\d\d-\d\d; nothing was changed\.$/);
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
      expect((await storedValues(t.sequelize, built.trialId)).map((v) => v.version)).toEqual(versions);
    });

    it('a dry run of a replacement shows new, changed and unchanged values with before and after', async () => {
      const response = await upload(t, built.tokens.collaborator, intakePath(built, built.siteId, '?dryRun=true'), fixture('replacement.csv'), 'replacement.csv');
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ dryRun: true, created: 0, updated: 3, unchanged: 24, identicalToPrevious: false });
      const changed = response.body.changes.filter((c: { kind: string }) => c.kind === 'changed');
      expect(changed).toEqual([
        // "12.5" over "12.50": the same number, but not what was typed, so it is a change.
        { plotLabel: 'TG-B1-P01', measureCode: 'DT', kind: 'changed', before: '12.50', after: '12.5' },
        { plotLabel: 'TG-B2-P01', measureCode: 'DT', kind: 'changed', before: '30', after: '31' },
        { plotLabel: 'TG-B2-P02', measureCode: 'WR', kind: 'changed', before: '210', after: 'NA (fox dug the bed)' },
      ]);
    });

    it('committing the replacement records every change in the audit trail', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const response = await upload(t, built.tokens.investigator, intakePath(built), fixture('replacement.csv'), 'replacement.csv');
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({ created: 0, updated: 3, unchanged: 24 });
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual({ ...before, changes: before.changes + 3, uploads: before.uploads + 1, activity: before.activity + 1 });
      const stored = await storedValues(t.sequelize, built.trialId);
      expect(stored.find((v) => v.plot === 'TG-B2-P02' && v.measure === 'WR')).toMatchObject({ valueText: null, missingReason: 'fox dug the bed', version: 2 });
      expect(stored.find((v) => v.plot === 'TG-B1-P02' && v.measure === 'DT')).toMatchObject({ version: 1 });

      const list = await t.http.get(`/api/trials/${built.trialId}/observations?siteId=${built.siteId}&measureId=${built.measures.DT}`).set(bearer(built.tokens.reviewer));
      const p01 = list.body.find((o: { plotLabel: string }) => o.plotLabel === 'TG-B1-P01');
      expect(p01).toMatchObject({ valueText: '12.5', valueNumber: 12.5, version: 2 });
      const history = await t.http.get(`/api/trials/${built.trialId}/observations/${p01.id}/history`).set(bearer(built.tokens.reviewer));
      expect(history.status).toBe(200);
      expect(history.body).toMatchObject([
        { source: 'upload', before: null, after: '12.50', by: 'Test Garden collaborator' },
        { source: 'upload', before: '12.50', after: '12.5', by: 'Intake investigator' },
      ]);
      const activity = await t.http.get(`/api/trials/${built.trialId}/activity?kind=intake.committed&siteId=${built.siteId}`).set(bearer(built.tokens.reviewer));
      expect(activity.body.map((a: { summary: string }) => a.summary)).toEqual([
        'Imported replacement.csv for Test Garden, Day 0: 0 new values, 3 changed, 24 unchanged.',
        'Imported good.csv for Test Garden, Day 0: 27 new values, 0 changed, 0 unchanged.',
      ]);
    });
  });

  it('tells about columns a file lacks without asking to accept it', async () => {
    const response = await upload(t, built.tokens.investigator, intakePath(built, built.otherSiteId, '?dryRun=true'), Buffer.from('plot label,crumble score\nOG-B2-P01,4\n'));
    expect(response.status).toBe(200);
    expect(response.body.warnings.map((w: { message: string }) => w.message)).toEqual([
      'The file has no column for drain time (the template calls it "drain time (s)"), so no drain time values are read from it.',
      'The file has no column for water retained (the template calls it "water retained (mL)"), so no water retained values are read from it.',
    ]);
    expect(response.body.message).toMatch(/^Nothing was written \(dry run\)\. Committing would add 1 new value, change 0 and leave 0 unchanged\.$/);
  });

  it('keeps a formula-looking note as text (neutralised only on export)', async () => {
    const response = await upload(t, built.tokens.investigator, intakePath(built), fixture('formula-notes.csv'), 'formula-notes.csv');
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    const stored = await storedValues(t.sequelize, built.trialId);
    expect(stored.find((v) => v.plot === 'TG-B1-P01' && v.measure === 'DT')).toMatchObject({ valueText: '12', notes: '=HYPERLINK("http://example.org","look")' });
  });

  describe('permissions', () => {
    const bytes = () => Buffer.from('plot label,crumble score\nOG-B3-P03,4\n');

    it('a collaborator of another site gets 403 and nothing is written', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      const response = await upload(t, built.tokens.collaborator, intakePath(built, built.otherSiteId), bytes());
      expect(response.status).toBe(403);
      expect(response.body.message).toBe("You collaborate on other sites of this trial; only its investigators and Other Garden's collaborators may record data there.");
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    });

    it('reviewers get 403, non-members 404, and the site collaborator may upload', async () => {
      const before = await rowCounts(t.sequelize, built.trialId);
      expect((await upload(t, built.tokens.reviewer, intakePath(built, built.otherSiteId), bytes())).status).toBe(403);
      const stranger = await upload(t, built.tokens.nonMember, intakePath(built, built.otherSiteId), bytes());
      expect(stranger.status).toBe(404);
      expect(stranger.body.message).toBe('No such trial.');
      expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
      expect((await upload(t, built.tokens.otherCollaborator, intakePath(built, built.otherSiteId), bytes())).status).toBe(200);
    });

    it('an unknown site or round of the trial is 404', async () => {
      expect((await upload(t, built.tokens.investigator, intakePath(built, 999_999_999), bytes())).status).toBe(404);
      const wrongRound = `/api/trials/${built.trialId}/sites/${built.siteId}/rounds/999999999/intake`;
      expect((await upload(t, built.tokens.investigator, wrongRound, bytes())).status).toBe(404);
    });
  });

  it('a locked trial refuses intake with 409 and says why; unlocking is recorded', async () => {
    const base = `/api/trials/${built.trialId}`;
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const before = await rowCounts(t.sequelize, built.trialId);
    const response = await upload(t, built.tokens.investigator, intakePath(built), fixture('good.csv'));
    expect(response.status).toBe(409);
    expect(response.body.message).toBe('This trial is locked; unlock it to change anything.');
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active' })).status).toBe(200);
    const log = await t.http.get(`${base}/activity?kind=trial.status-changed`).set(bearer(built.tokens.reviewer));
    expect(log.body[0]).toMatchObject({ summary: 'Changed the trial from locked to active.', details: { from: 'locked', to: 'active' }, userId: built.ids.investigator });
  });
});
