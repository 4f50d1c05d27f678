import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createTestApp, type TestApp } from '../support/test-app';
import { buildIntakeTrial, intakePath, storedValues, upload, type IntakeTrial } from './intake-support';

/** A notes column named after a measure ("drain time note") belongs to that measure's value of the row alone. */
describe('Intake: a note goes to the measure it belongs to', () => {
  let t: TestApp;
  let built: IntakeTrial;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  const notesOf = async () =>
    Object.fromEntries((await storedValues(t.sequelize, built.trialId)).filter((v) => v.plot.startsWith('TG-B1-')).map((v) => [`${v.plot} ${v.measure}`, v.notes]));

  it('stores a measure’s own note on its value only, and the row’s notes on every value (own note first) — straight into an empty round', async () => {
    const csv = [
      'plot label,drain time (s),crumble score,water retained (mL),drain time note,notes',
      'TG-B1-P01,120,3,210,poured twice,',
      'TG-B1-P02,200,4,220,,bed shaded',
      'TG-B1-P03,300,2,230,puddle,bed shaded',
    ].join('\n');
    const response = await upload(t, built.tokens.investigator, intakePath(built), Buffer.from(`${csv}\n`), 'notes.csv');
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(await notesOf()).toEqual({
      'TG-B1-P01 CS': null,
      'TG-B1-P01 DT': 'poured twice',
      'TG-B1-P01 WR': null,
      'TG-B1-P02 CS': 'bed shaded',
      'TG-B1-P02 DT': 'bed shaded',
      'TG-B1-P02 WR': 'bed shaded',
      'TG-B1-P03 CS': 'bed shaded',
      'TG-B1-P03 DT': 'puddle; bed shaded',
      'TG-B1-P03 WR': 'bed shaded',
    });
  });

  it('replaces only the notes of the measures the next file gives notes for, keeping the others as stored (merged upload)', async () => {
    // A note typed in the Ledger on a crumble score meanwhile.
    const list = (await t.http.get(`/api/trials/${built.trialId}/observations?siteId=${built.siteId}&measureId=${built.measures.CS}`).set(bearer(built.tokens.investigator))).body as Array<{
      id: number;
      plotLabel: string;
      valueText: string;
      version: number;
    }>;
    const crumble = list.find((o) => o.plotLabel === 'TG-B1-P01')!;
    const edit = await t.http.patch(`/api/trials/${built.trialId}/observations/${crumble.id}`).set(bearer(built.tokens.investigator)).send({ version: crumble.version, value: crumble.valueText, notes: 'crumbly at the edge' });
    expect(edit.status, JSON.stringify(edit.body)).toBe(200);
    // The code spelling of the header, and no notes column for the row: crumble score and water retained notes stay.
    const csv = ['plot label,drain time (s),crumble score,water retained (mL),DT notes', 'TG-B1-P01,120,3,210,re-poured', 'TG-B1-P02,200,4,220,', 'TG-B1-P03,300,2,230,puddle'].join('\n');
    const response = await upload(t, built.tokens.investigator, intakePath(built), Buffer.from(`${csv}\n`), 'notes-again.csv');
    expect(response.status, JSON.stringify(response.body)).toBe(200);
    expect(await notesOf()).toEqual({
      'TG-B1-P01 CS': 'crumbly at the edge',
      'TG-B1-P01 DT': 're-poured',
      'TG-B1-P01 WR': null,
      'TG-B1-P02 CS': 'bed shaded',
      'TG-B1-P02 DT': null,
      'TG-B1-P02 WR': 'bed shaded',
      'TG-B1-P03 CS': 'bed shaded',
      'TG-B1-P03 DT': 'puddle',
      'TG-B1-P03 WR': 'bed shaded',
    });
    // Only the drain time values whose notes changed count as updated; the rest are unchanged.
    expect(response.body).toMatchObject({ created: 0, updated: 3, unchanged: 6 });
  });
});
