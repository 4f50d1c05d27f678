import type { Findings, Observation } from '@friable/contracts';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FindingsCache } from '../../src/findings/findings-cache';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp, patchCurrent } from '../support/test-app';

/**
 * The Findings cache: answers kept per API instance under the trial's data stamp; any write through any
 * instance (here a second API instance on the same database) makes the next answer fresh.
 */
describe('Findings cache: kept until the next write, through any instance', () => {
  let one: TestApp;
  let two: TestApp;
  let built: IntakeTrial;
  let other: IntakeTrial;
  let findingsPath: string;
  const counts = () => ({ ...one.app.get(FindingsCache).counts });
  const findings = async (query = '') => {
    const response = await one.http.get(`${findingsPath}${query}`).set(bearer(built.tokens.reviewer));
    expect(response.status).toBe(200);
    return response.body as Findings;
  };

  beforeAll(async () => {
    one = await createTestApp();
    two = await createTestApp();
    built = await buildIntakeTrial(one);
    other = await buildIntakeTrial(one);
    const labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
    const csv = ['plot label,water retained (mL)', ...labels.map((label, i) => `${label},${100 + i * 7 + (i % 3) * 11}`)].join('\n');
    const response = await upload(one, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
    if (response.status !== 200) throw new Error(JSON.stringify(response.body));
    findingsPath = `/api/trials/${built.trialId}/findings?measureId=${built.measures.WR}&roundId=${built.roundId}&siteId=${built.siteId}`;
  }, 120_000); // two API instances and two trials: over a minute on a busy two-core machine
  afterAll(async () => {
    await one.close();
    await two.close();
  });

  it('answers a repeated request from the cache, the same body as computed', async () => {
    const first = await findings();
    const before = counts();
    const second = await findings();
    expect(second).toEqual(first);
    expect(counts()).toEqual({ hits: before.hits + 1, misses: before.misses });
  });

  it('keys by the options: another alpha or method is computed, not served from the first answer', async () => {
    const before = counts();
    const lsd = await findings('&method=lsd&alpha=0.1');
    expect(lsd.context.choices).toMatchObject({ method: 'lsd', alpha: 0.1 });
    expect(counts().misses).toBe(before.misses + 1);
  });

  it('a write through another instance makes the next answer fresh (new value, new data hash)', async () => {
    const stale = await findings();
    const list = await two.http.get(`/api/trials/${built.trialId}/observations?measureId=${built.measures.WR}&siteId=${built.siteId}`).set(bearer(built.tokens.reviewer));
    const cell = (list.body as Observation[])[0]!;
    const edit = await two.http.patch(`/api/trials/${built.trialId}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: cell.version, value: '311' });
    expect(edit.status).toBe(200);
    const before = counts();
    const fresh = await findings();
    expect(counts().misses).toBe(before.misses + 1);
    expect(fresh.context.observations.find((o) => o.observationId === cell.id)?.value).toBe('311');
    expect(fresh.context.dataHash).not.toBe(stale.context.dataHash);
    expect(fresh.means).not.toEqual(stale.means);
  });

  it('a write to another trial leaves this trial’s answers cached; a write outside any trial does not', async () => {
    await findings();
    let before = counts();
    const rename = await patchCurrent(two, `/api/trials/${other.trialId}`, bearer(other.tokens.investigator), { title: 'Another title' });
    expect(rename.status, JSON.stringify(rename.body)).toBe(200);
    await findings();
    expect(counts()).toEqual({ hits: before.hits + 1, misses: before.misses });
    const [stamp] = await one.sequelize.query<{ stamp: string }>("SELECT stamp FROM data_stamps WHERE scope = 'all'", { type: QueryTypes.SELECT });
    const me = await two.http.patch('/api/users/me').set(bearer(built.tokens.reviewer)).send({ name: 'Cache reviewer' });
    expect(me.status, JSON.stringify(me.body)).toBe(200);
    const [after] = await one.sequelize.query<{ stamp: string }>("SELECT stamp FROM data_stamps WHERE scope = 'all'", { type: QueryTypes.SELECT });
    expect(after!.stamp).not.toBe(stamp?.stamp);
    before = counts();
    await findings();
    expect(counts().misses).toBe(before.misses + 1);
  });

  it('a refused write (a stale version, 409) leaves the cached answer in place', async () => {
    await findings();
    const list = await one.http.get(`/api/trials/${built.trialId}/observations?measureId=${built.measures.WR}&siteId=${built.siteId}`).set(bearer(built.tokens.reviewer));
    const cell = (list.body as Observation[])[1]!;
    const stale = await two.http.patch(`/api/trials/${built.trialId}/observations/${cell.id}`).set(bearer(built.tokens.collaborator)).send({ version: cell.version + 5, value: '222' });
    expect(stale.status).toBe(409);
    const before = counts();
    await findings();
    expect(counts()).toEqual({ hits: before.hits + 1, misses: before.misses });
  });

  it('fifty requests at once for a changed answer share one computation', async () => {
    const touch = await patchCurrent(two, `/api/trials/${built.trialId}`, bearer(built.tokens.investigator), { title: 'Retitled while cached' });
    expect(touch.status, JSON.stringify(touch.body)).toBe(200);
    const before = counts();
    const answers = await Promise.all(Array.from({ length: 50 }, () => one.http.get(findingsPath).set(bearer(built.tokens.reviewer))));
    expect(answers.map((a) => a.status)).toEqual(Array(50).fill(200));
    expect(counts().misses).toBe(before.misses + 1);
    expect(new Set(answers.map((a) => a.body.context.dataHash)).size).toBe(1);
  });

  it('refusals are not kept: a round without values answers 422 each time', async () => {
    const empty = `/api/trials/${built.trialId}/findings?measureId=${built.measures.CS}&roundId=${built.roundId}&siteId=${built.otherSiteId}`;
    for (let i = 0; i < 2; i += 1) {
      const response = await one.http.get(empty).set(bearer(built.tokens.reviewer));
      expect(response.status).toBe(422);
    }
  });
});
