import type { ActivityEntry } from '@friable/contracts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ActivityService } from '../../src/activity/activity.service';
import { ActivityEntryRow } from '../../src/activity/models/activity-entry.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from '../protocol/protocol-builder';

describe('GET /api/trials/:trialId/activity', () => {
  let t: TestApp;
  let built: BuiltTrial;
  let auth: { Authorization: string };
  let base: string;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildSmallTrial(t);
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}/activity`;
  });
  afterAll(() => t.close());

  it('lists every change of the build, newest first', async () => {
    const entries = await expectStatus<ActivityEntry[]>(t.http.get(base).set(auth), 200);
    expect(entries.map((e) => e.kind)).toEqual([
      'site.randomized',
      'site.created',
      'round.created',
      'measure.created',
      'measure.created',
      'treatment.created',
      'treatment.created',
      'treatment.created',
      'trial.created',
    ]);
    expect(entries.map((e) => e.id)).toEqual([...entries.map((e) => e.id)].sort((a, b) => b - a));
    expect(entries.at(-1)).toMatchObject({ userId: built.investigatorId, userName: 'Builder', siteId: null, summary: expect.stringMatching(/^Created trial B-[A-Z0-9]+ \(rcbd\) with seed small-seed\.$/) });
    expect(await ActivityEntryRow.count({ where: { trialId: built.trialId } })).toBe(9);
  });

  it('filters by kind, site and person', async () => {
    const siteId = built.sites['Test Garden'];
    const bySite = await expectStatus<ActivityEntry[]>(t.http.get(`${base}?siteId=${siteId}`).set(auth), 200);
    expect(bySite.map((e) => e.kind)).toEqual(['site.randomized', 'site.created']);
    const byKind = await expectStatus<ActivityEntry[]>(t.http.get(`${base}?kind=treatment.created`).set(auth), 200);
    expect(byKind.map((e) => e.details.code)).toEqual(['K', 'G', 'C']);
    const other = await createPerson();
    expect(await expectStatus<ActivityEntry[]>(t.http.get(`${base}?userId=${other.id}`).set(auth), 200)).toEqual([]);
    expect((await expectStatus<ActivityEntry[]>(t.http.get(`${base}?userId=${built.investigatorId}`).set(auth), 200)).length).toBe(9);
    const bad = await t.http.get(`${base}?siteId=abc`).set(auth);
    expect(bad.status).toBe(422);
    expect(bad.body.errors[0].field).toBe('siteId');
  });

  it('records entries other features write with ActivityService.record, in their transaction', async () => {
    const service = t.app.get(ActivityService);
    await t.sequelize.transaction((transaction) =>
      service.record(transaction, { trialId: built.trialId, userId: built.investigatorId, kind: 'invitation.sent', summary: 'Invited someone.', details: { email: 'x@example.org' } }),
    );
    await expect(
      t.sequelize.transaction(async (transaction) => {
        await service.record(transaction, { trialId: built.trialId, userId: null, kind: 'invitation.sent', summary: 'Rolled back.' });
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    const sent = await expectStatus<ActivityEntry[]>(t.http.get(`${base}?kind=invitation.sent`).set(auth), 200);
    expect(sent).toEqual([expect.objectContaining({ summary: 'Invited someone.', details: { email: 'x@example.org' } })]);
  });

  it('is readable by a reviewer and not by a stranger', async () => {
    const reviewer = await createPerson();
    await TrialMembership.create({ trialId: built.trialId, userId: reviewer.id, role: 'reviewer', siteId: null });
    expect((await t.http.get(base).set(bearer(await tokenFor(t, reviewer)))).status).toBe(200);
    expect((await t.http.get(base).set(bearer(await tokenFor(t, await createPerson())))).status).toBe(404);
  });
});
