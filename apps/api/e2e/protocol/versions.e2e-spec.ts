import type { ActivityEntry, Factor, TrialDetail } from '@friable/contracts';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildFactorTrial } from '../designs/design-builder';
import { bearer, createTestApp, patchCurrent, type TestApp } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from './protocol-builder';

// Edits that cannot be lost: every protocol record carries a version, a stale edit is refused with the stored
// record, the audit keeps old and new values, and a deleted row is archived, not removed.
describe('protocol versions, stale edits and archiving', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let base: string;
  let auth: ReturnType<typeof bearer>;

  const detail = async () => expectStatus<TrialDetail>(t.http.get(base).set(auth), 200);
  const stored = async (table: string, id: number) =>
    (await t.sequelize.query<Record<string, unknown>>(`SELECT * FROM \`${table}\` WHERE id = ?`, { replacements: [id], type: QueryTypes.SELECT }))[0]!;
  const activity = async (kind: string) => expectStatus<ActivityEntry[]>(t.http.get(`${base}/activity`).query({ kind }).set(auth), 200);

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t, { randomize: false });
    base = `/api/trials/${built.trialId}`;
    auth = bearer(built.token);
  });
  afterAll(() => t.close());

  it('answers the version of the trial and of every protocol row', async () => {
    const trial = await detail();
    expect(trial.version).toBeGreaterThanOrEqual(1);
    for (const rows of [trial.treatments, trial.measures, trial.rounds, trial.sites]) {
      expect(rows.length).toBeGreaterThan(0);
      for (const row of rows) expect(row.version).toBe(1);
    }
  });

  const records = [
    { name: 'trial', path: () => base, table: 'trials', id: () => built.trialId, column: 'title', field: 'title', first: 'First title', second: 'Second title' },
    { name: 'treatment', path: () => `${base}/treatments/${built.treatments.K}`, table: 'treatments', id: () => built.treatments.K!, column: 'name', field: 'name', first: 'Compost, sieved', second: 'Compost, coarse' },
    { name: 'measure', path: () => `${base}/measures/${built.measures.DT}`, table: 'measures', id: () => built.measures.DT!, column: 'name', field: 'name', first: 'drain time first', second: 'drain time second' },
    { name: 'round', path: () => `${base}/rounds/${built.rounds['Day 0']}`, table: 'assessment_rounds', id: () => built.rounds['Day 0']!, column: 'label', field: 'label', first: 'Day zero', second: 'Start' },
    { name: 'site', path: () => `${base}/sites/${built.sites['Test Garden']}`, table: 'sites', id: () => built.sites['Test Garden']!, column: 'location', field: 'location', first: 'North bed', second: 'South bed' },
  ];

  it('a lock or an unlock sent from an old copy of the trial answers 409 with the trial as stored, and changes nothing', async () => {
    // A trial of its own, randomized so that it can be activated and locked.
    const ready = await buildSmallTrial(t);
    const base = `/api/trials/${ready.trialId}`;
    const auth = bearer(ready.token);
    const detail = async () => expectStatus<TrialDetail>(t.http.get(base).set(auth), 200);
    const draft = await detail();
    const activated = await t.http.patch(base).set(auth).send({ version: draft.version, status: 'active' });
    expect(activated.status, JSON.stringify(activated.body)).toBe(200);
    const opened = await detail();
    // Someone else saves the trial after the page read it.
    expect((await t.http.patch(base).set(auth).send({ version: opened.version, title: 'Renamed before the lock' })).status).toBe(200);
    const staleLock = await t.http.patch(base).set(auth).send({ version: opened.version, status: 'locked' });
    expect(staleLock.status).toBe(409);
    expect(staleLock.body.current).toMatchObject({ id: ready.trialId, version: opened.version + 1, status: 'active', title: 'Renamed before the lock' });
    expect((await stored('trials', ready.trialId)).status).toBe('active');

    const locked = await t.http.patch(base).set(auth).send({ version: opened.version + 1, status: 'locked' });
    expect(locked.status, JSON.stringify(locked.body)).toBe(200);
    const lockedVersion = (await detail()).version;
    // An unlock from the page as it was before the lock is refused the same way.
    const staleUnlock = await t.http.patch(base).set(auth).send({ version: opened.version + 1, status: 'active' });
    expect(staleUnlock.status).toBe(409);
    expect(staleUnlock.body.current).toMatchObject({ status: 'locked', version: lockedVersion });
    expect((await stored('trials', ready.trialId)).status).toBe('locked');
    expect((await t.http.patch(base).set(auth).send({ version: lockedVersion, status: 'active' })).status).toBe(200);
  });

  it.each(records)('two edits of a $name at once: the first is saved, the second answers 409 with the current $name', async (r) => {
    const before = await detail();
    const version = r.name === 'trial' ? before.version : (before[`${r.name === 'round' ? 'rounds' : `${r.name}s`}` as 'treatments'].find((row) => row.id === r.id())!.version);
    const [first, second] = await Promise.all([
      t.http.patch(r.path()).set(auth).send({ version, [r.field]: r.first }),
      t.http.patch(r.path()).set(auth).send({ version, [r.field]: r.second }),
    ]);
    const statuses = [first.status, second.status].sort();
    expect(statuses).toEqual([200, 409]);
    const [saved, refused] = first.status === 200 ? [first, second] : [second, first];
    expect(saved.body.version).toBe(version + 1);
    expect(refused.body).toMatchObject({ statusCode: 409, error: 'Conflict' });
    expect(refused.body.message).toContain(`your version ${version}, now ${version + 1}`);
    // The refused edit comes back with what is stored now: the saved edit's value and version.
    expect(refused.body.current.version).toBe(version + 1);
    expect(refused.body.current[r.field]).toBe(saved.body[r.field]);
    const row = await stored(r.table, r.id());
    expect(row[r.column]).toBe(saved.body[r.field]);
    expect(Number(row.version)).toBe(version + 1);
  });

  it('refuses an edit without a version with 422 naming the field, writing nothing', async () => {
    const before = await stored('treatments', built.treatments.G!);
    const response = await t.http.patch(`${base}/treatments/${built.treatments.G}`).set(auth).send({ name: 'No version' });
    expect(response.status).toBe(422);
    expect(response.body.errors.map((e: { field: string }) => e.field)).toContain('version');
    expect(await stored('treatments', built.treatments.G!)).toEqual(before);
  });

  it('keeps the old and the new values in the audit entry of an edit', async () => {
    await expectStatus(patchCurrent(t, `${base}/treatments/${built.treatments.G}`, auth, { name: 'Gypsum, fine', rateValue: 45 }), 200);
    const [entry] = await activity('treatment.updated');
    expect(entry!.details).toMatchObject({
      treatmentId: built.treatments.G,
      changed: ['name', 'rateValue'],
      before: { name: 'Gypsum', rateValue: 40 },
      after: { name: 'Gypsum, fine', rateValue: 45 },
    });
    await expectStatus(patchCurrent(t, base, auth, { question: 'Does gypsum loosen clay?' }), 200);
    const [trialEntry] = await activity('trial.updated');
    expect(trialEntry!.details).toMatchObject({ changed: ['question'], before: { question: null }, after: { question: 'Does gypsum loosen clay?' } });
  });

  it('archives a deleted measure: gone from the protocol, kept in the database and shown in the activity trail', async () => {
    const extra = await expectStatus<{ id: number }>(
      t.http.post(`${base}/measures`).set(auth).send({ code: 'ST', name: 'stone share', unit: '%', kind: 'continuous', higherIsBetter: true, decimals: 1 }),
      201,
    );
    await expectStatus(patchCurrent(t, `${base}/rounds/${built.rounds['Day 0']}`, auth, { measureIds: [...Object.values(built.measures), extra.id] }), 200);
    expect((await t.http.delete(`${base}/measures/${extra.id}`).set(auth)).status).toBe(204);
    const after = await detail();
    expect(after.measures.map((m) => m.code)).not.toContain('ST');
    expect(after.rounds[0]!.measureIds).not.toContain(extra.id);
    const row = await stored('measures', extra.id);
    expect(row).toMatchObject({ code: 'ST', name: 'stone share' });
    expect(row.deleted_at).not.toBeNull();
    const [entry] = await activity('measure.archived');
    expect(entry!.summary).toBe('Archived measure ST (stone share); it leaves the protocol and stays on record.');
    expect(entry!.details).toMatchObject({ measureId: extra.id, archived: { code: 'ST', name: 'stone share' } });
    // The code is free again for a live measure; the archived one keeps it on record.
    const again = await expectStatus<{ id: number }>(
      t.http.post(`${base}/measures`).set(auth).send({ code: 'ST', name: 'stone share again', unit: '%', kind: 'continuous', higherIsBetter: true, decimals: 1 }),
      201,
    );
    expect(again.id).not.toBe(extra.id);
  });

  it('archives a deleted site, its layout cleared', async () => {
    const spare = await expectStatus<{ id: number }>(
      t.http.post(`${base}/sites`).set(auth).send({ name: 'Spare Bed', shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 4, labelPrefix: 'SB' }),
      201,
    );
    await expectStatus(t.http.post(`${base}/sites/${spare.id}/randomize`).set(auth).send({}), 200);
    expect((await t.http.delete(`${base}/sites/${spare.id}`).set(auth)).status).toBe(204);
    expect((await detail()).sites.map((s) => s.name)).not.toContain('Spare Bed');
    expect((await stored('sites', spare.id)).deleted_at).not.toBeNull();
    const [plots] = await t.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM plots WHERE site_id = ?', { replacements: [spare.id], type: QueryTypes.SELECT });
    expect(Number(plots!.n)).toBe(0);
    expect((await activity('site.archived'))[0]!.summary).toBe('Archived site Spare Bed; it leaves the protocol and stays on record.');
  });

  it('refuses a stale PUT of the factors with 409 and the current factors', async () => {
    const trial = await buildFactorTrial(t, {
      design: 'factorial-rcbd',
      seed: 'versions',
      factors: [
        { name: 'Gypsum', levels: [{ code: 'G0', name: 'None' }, { code: 'G1', name: 'Some' }] },
        { name: 'Mulch', levels: [{ code: 'M0', name: 'Bare' }, { code: 'M1', name: 'Woodchip' }] },
      ],
      sites: [{ name: 'Factor Bed', labelPrefix: 'FB', blocks: 4 }],
      randomize: false,
    });
    const factors = await expectStatus<Factor[]>(t.http.get(`${trial.base}/factors`).set(trial.auth), 200);
    const body = (name: string) => ({
      factors: factors.map((f, index) => ({ name: index === 0 ? name : f.name, version: f.version, levels: f.levels.map((l) => ({ code: l.code, name: l.name })) })),
    });
    const saved = await expectStatus<{ factors: Factor[] }>(t.http.put(`${trial.base}/factors`).set(trial.auth).send(body('Gypsum rate')), 200);
    expect(saved.factors[0]!.version).toBe(factors[0]!.version + 1);
    const stale = await t.http.put(`${trial.base}/factors`).set(trial.auth).send(body('Gypsum amount'));
    expect(stale.status).toBe(409);
    expect(stale.body.current.map((f: Factor) => f.name)).toEqual(['Gypsum rate', 'Mulch']);
    const missing = await t.http.put(`${trial.base}/factors`).set(trial.auth).send({ factors: body('x').factors.map(({ version: _version, ...f }) => f) });
    expect(missing.status).toBe(422);
    expect(missing.body.errors.map((e: { field: string }) => e.field)).toContain('factors[0].version');
  });
});
