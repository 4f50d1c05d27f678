import type { Observation, RemovalImpact } from '@friable/contracts';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ActivityEntryRow } from '../../src/activity/models/activity-entry.model';
import { MeasureRow } from '../../src/measures/models/measure.model';
import { ObservationRow } from '../../src/observations/models/observation.model';
import { AssessmentRoundRow } from '../../src/rounds/models/assessment-round.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, patchCurrent, tokenFor, type TestApp } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from './protocol-builder';

/** The Activity entry's details as stored (JSON text in the column). */
const details = (entry: ActivityEntryRow | null) => (typeof entry?.details === 'string' ? JSON.parse(entry.details) : entry?.details);

const ARCHIVED = 'They are archived: kept on record, but no longer shown in the Ledger, Findings, exports or reports.';

/**
 * Removing a measure that has values, or a round that has data, says exactly what it archives and needs the trial
 * code typed; the rows stay on record (archived), leave every reading, and the Activity log says what went.
 */
describe('Removing a measure or round with data: what it archives, and the typed confirmation', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let auth: Record<string, string>;
  let base: string;
  let code: string;
  let secondSiteId: number;
  let weekTwo: number;

  /** Records a value on the n-th plot (by label) of a site. */
  async function record(siteId: number, index: number, roundId: number, measureId: number, body: { value: string; missingReason?: string; notes?: string }) {
    const plots = ((await t.http.get(`${base}/plots?siteId=${siteId}`).set(auth)).body as Array<{ id: number; label: string }>).sort((a, b) => a.label.localeCompare(b.label));
    await expectStatus(t.http.post(`${base}/observations`).set(auth).send({ plotId: plots[index]!.id, roundId, measureId, ...body }), 201);
    return plots[index]!;
  }

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t);
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}`;
    code = ((await t.http.get(base).set(auth)).body as { code: string }).code;
    secondSiteId = (await expectStatus<{ id: number }>(t.http.post(`${base}/sites`).set(auth).send({ name: 'Second Garden', shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 4, labelPrefix: 'SG' }), 201)).id;
    await expectStatus(t.http.post(`${base}/sites/${secondSiteId}/randomize`).set(auth).send({}), 200);
    weekTwo = (await expectStatus<{ id: number }>(t.http.post(`${base}/rounds`).set(auth).send({ label: 'Week 2', dayOffset: 14, measureIds: [built.measures.DT, built.measures.CS] }), 201)).id;
    await expectStatus(patchCurrent(t, base, auth, { status: 'active' }), 200);
    const [garden, day0, drain, crumble] = [built.sites['Test Garden']!, built.rounds['Day 0']!, built.measures.DT!, built.measures.CS!];
    // Drain time: 4 values at Test Garden (one censored, one missing with its reason, one with a note, one in Week 2), 2 at Second Garden (one with a note).
    await record(garden, 0, day0, drain, { value: '120' });
    await record(garden, 1, day0, drain, { value: '>600' });
    await record(garden, 2, day0, drain, { value: 'NA', missingReason: 'plot flooded' });
    await record(garden, 3, weekTwo, drain, { value: '95', notes: 'poured slowly' });
    await record(secondSiteId, 0, day0, drain, { value: '200', notes: 'puddle on the path' });
    await record(secondSiteId, 1, day0, drain, { value: '210' });
    // Crumble score: one value in each round at Test Garden.
    await record(garden, 0, day0, crumble, { value: '3' });
    await record(garden, 1, weekTwo, crumble, { value: '4' });
    // A photo of Week 2 at Second Garden.
    const photoPlot = ((await t.http.get(`${base}/plots?siteId=${secondSiteId}`).set(auth)).body as Array<{ id: number }>)[0]!;
    const png = readFileSync(resolve(__dirname, '../photos/fixtures/tiny.png'));
    await expectStatus(t.http.put(`${base}/plots/${photoPlot.id}/rounds/${weekTwo}/photo`).set(auth).attach('file', png, { filename: 'bed.png', contentType: 'image/png' }), 200);
  });
  afterAll(() => t.close());

  it('says what removing a measure with values archives, per site and in words, counted from the rows', async () => {
    const impact = await expectStatus<RemovalImpact>(t.http.get(`${base}/measures/${built.measures.DT}/removal-impact`).set(auth), 200);
    expect(impact).toEqual({
      item: 'measure DT (drain time)',
      sites: [
        { siteId: built.sites['Test Garden'], siteName: 'Test Garden', values: 4, censored: 1, missing: 1, notes: 1, photos: 0 },
        { siteId: secondSiteId, siteName: 'Second Garden', values: 2, censored: 0, missing: 0, notes: 1, photos: 0 },
      ],
      values: 6,
      censored: 1,
      missing: 1,
      notes: 2,
      photos: 0,
      summary: `Removes 6 recorded values and 2 notes of drain time across 2 sites (1 censored and 1 missing with a reason). ${ARCHIVED}`,
      confirmationNeeded: true,
      refusal: null,
    });
    expect(impact.values).toBe(await ObservationRow.count({ where: { trialId: built.trialId, measureId: built.measures.DT } }));
  });

  it('refuses the removal in words until the trial code is typed, writing nothing', async () => {
    const missing = await t.http.delete(`${base}/measures/${built.measures.DT}`).set(auth);
    expect(missing.status).toBe(422);
    expect(missing.body.errors).toEqual([{ field: 'confirm', message: `removing measure DT (drain time) archives 6 recorded values and 2 notes: type the trial code ${code} to confirm` }]);
    const wrong = await t.http.delete(`${base}/measures/${built.measures.DT}?confirm=GT-OTHER`).set(auth);
    expect(wrong.status).toBe(422);
    expect(wrong.body.message).toBe(`Please correct: “GT-OTHER” is not the trial code: type ${code} to confirm removing measure DT (drain time), which archives 6 recorded values and 2 notes.`);
    const tooLong = await t.http.delete(`${base}/measures/${built.measures.DT}?confirm=${'X'.repeat(41)}`).set(auth);
    expect([tooLong.status, tooLong.body.message]).toEqual([422, expect.stringContaining('confirmation must be at most 40 characters')]);
    expect(await MeasureRow.count({ where: { trialId: built.trialId } })).toBe(2);
    expect(await ActivityEntryRow.count({ where: { trialId: built.trialId, kind: 'measure.archived' } })).toBe(0);
  });

  it('archives the measure with the code typed in any case: rows kept, gone from the Ledger and the export, logged', async () => {
    await expectStatus(t.http.delete(`${base}/measures/${built.measures.DT}?confirm=${encodeURIComponent(` ${code.toLowerCase()} `)}`).set(auth), 204);
    const measures = (await t.http.get(`${base}/measures`).set(auth)).body as Array<{ code: string }>;
    expect(measures.map((m) => m.code)).toEqual(['CS']);
    // Archived, not erased: the measure row (paranoid) and its six values are still stored.
    const archived = await MeasureRow.findByPk(built.measures.DT, { paranoid: false });
    expect(archived?.getDataValue('deletedAt')).toBeInstanceOf(Date);
    expect(await ObservationRow.count({ where: { trialId: built.trialId, measureId: built.measures.DT } })).toBe(6);
    const ledger = (await t.http.get(`${base}/observations`).set(auth)).body as Observation[];
    expect(ledger.map((o) => o.measureCode)).toEqual(['CS', 'CS']);
    const csv = (await t.http.get(`${base}/export.csv`).set(auth)).text;
    expect(csv.trim().split('\n').slice(1).map((line) => line.split(',').slice(5, 9).join(' '))).toEqual(['Day 0 CS score 3', 'Week 2 CS score 4']);
    const entry = await ActivityEntryRow.findOne({ where: { trialId: built.trialId, kind: 'measure.archived' } });
    expect(entry?.summary).toBe('Archived measure DT (drain time) with its 6 recorded values and 2 notes across 2 sites; it leaves the protocol and stays on record.');
    expect(details(entry)).toMatchObject({ measureId: built.measures.DT, confirmed: true, values: { recorded: 6, censored: 1, missing: 1, notes: 2 } });
  });

  it('says what removing a round archives — values of the measures still shown, and its photos — and needs the code too', async () => {
    const impact = await expectStatus<RemovalImpact>(t.http.get(`${base}/rounds/${weekTwo}/removal-impact`).set(auth), 200);
    // Week 2's drain time value went with its measure; what is left is one crumble score and one photo.
    expect(impact).toMatchObject({
      item: 'round Week 2',
      sites: [
        { siteName: 'Test Garden', values: 1, notes: 0, photos: 0 },
        { siteName: 'Second Garden', values: 0, notes: 0, photos: 1 },
      ],
      values: 1,
      photos: 1,
      summary: `Removes 1 recorded value and 1 photo of round Week 2 across 2 sites. ${ARCHIVED}`,
      confirmationNeeded: true,
      refusal: null,
    });
    const refused = await t.http.delete(`${base}/rounds/${weekTwo}`).set(auth);
    expect([refused.status, refused.body.errors]).toEqual([422, [{ field: 'confirm', message: `removing round Week 2 archives 1 recorded value and 1 photo: type the trial code ${code} to confirm` }]]);
    expect(await AssessmentRoundRow.count({ where: { trialId: built.trialId } })).toBe(2);

    await expectStatus(t.http.delete(`${base}/rounds/${weekTwo}?confirm=${code}`).set(auth), 204);
    expect((await AssessmentRoundRow.findByPk(weekTwo, { paranoid: false }))?.getDataValue('deletedAt')).toBeInstanceOf(Date);
    expect(await ObservationRow.count({ where: { trialId: built.trialId, roundId: weekTwo } })).toBe(2);
    const ledger = (await t.http.get(`${base}/observations`).set(auth)).body as Observation[];
    expect(ledger.map((o) => `${o.roundLabel} ${o.measureCode} ${o.valueText}`)).toEqual(['Day 0 CS 3']);
    const entry = await ActivityEntryRow.findOne({ where: { trialId: built.trialId, kind: 'round.archived' } });
    expect(entry?.summary).toBe('Archived assessment round Week 2 with its 1 recorded value and 1 photo across 2 sites; it leaves the protocol and stays on record.');
    expect(details(entry)).toMatchObject({ roundId: weekTwo, confirmed: true, values: { recorded: 1, photos: 1 } });
  });

  it('asks nothing more for a measure without values, and refuses the only measure of a round whatever is typed', async () => {
    const spare = await expectStatus<{ id: number }>(t.http.post(`${base}/measures`).set(auth).send({ code: 'BD', name: 'bulk density', unit: 'g/cm3', kind: 'continuous', decimals: 2, higherIsBetter: false }), 201);
    const lone = await expectStatus<{ id: number }>(t.http.post(`${base}/measures`).set(auth).send({ code: 'PR', name: 'penetration resistance', unit: 'kPa', kind: 'continuous', decimals: 0, higherIsBetter: false }), 201);
    await expectStatus(t.http.post(`${base}/rounds`).set(auth).send({ label: 'Week 8', dayOffset: 56, measureIds: [lone.id] }), 201);

    const free = await expectStatus<RemovalImpact>(t.http.get(`${base}/measures/${spare.id}/removal-impact`).set(auth), 200);
    expect(free).toEqual({
      item: 'measure BD (bulk density)',
      sites: [],
      values: 0,
      censored: 0,
      missing: 0,
      notes: 0,
      photos: 0,
      summary: 'Removes measure BD (bulk density) from the protocol and from every round; no values are recorded for it.',
      confirmationNeeded: false,
      refusal: null,
    });
    // Other measures' values no longer refuse it: nothing of its own is lost.
    await expectStatus(t.http.delete(`${base}/measures/${spare.id}`).set(auth), 204);
    expect((await ActivityEntryRow.findAll({ where: { trialId: built.trialId, kind: 'measure.archived' }, order: [['id', 'ASC']] })).at(-1)?.summary).toBe(
      'Archived measure BD (bulk density); it leaves the protocol and stays on record.',
    );

    const only = await expectStatus<RemovalImpact>(t.http.get(`${base}/measures/${lone.id}/removal-impact`).set(auth), 200);
    expect(only.refusal).toBe('Measure PR is the only measure of round Week 8; give that round another measure or delete it first.');
    const refused = await t.http.delete(`${base}/measures/${lone.id}?confirm=${code}`).set(auth);
    expect([refused.status, refused.body.message]).toEqual([409, only.refusal]);
  });

  it('is for the investigator: a collaborator is refused both, an unknown measure or round is 404', async () => {
    const collaborator = await createPerson({ name: 'Removal collaborator' });
    await TrialMembership.create({ trialId: built.trialId, userId: collaborator.id, role: 'collaborator', siteId: built.sites['Test Garden'] });
    const theirs = bearer(await tokenFor(t, collaborator));
    expect((await t.http.get(`${base}/measures/${built.measures.CS}/removal-impact`).set(theirs)).status).toBe(403);
    expect((await t.http.delete(`${base}/measures/${built.measures.CS}?confirm=${code}`).set(theirs)).status).toBe(403);
    expect((await t.http.get(`${base}/measures/999999999/removal-impact`).set(auth)).status).toBe(404);
    expect((await t.http.get(`${base}/rounds/999999999/removal-impact`).set(auth)).status).toBe(404);
    // An archived measure is gone for the impact question too.
    expect((await t.http.get(`${base}/measures/${built.measures.DT}/removal-impact`).set(auth)).status).toBe(404);
  });
});
