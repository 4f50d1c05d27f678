import type { Member } from '@friable/contracts';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOpenApiDocument } from '../../src/openapi/openapi-document';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import type { User } from '../../src/users/models/user.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp, patchCurrent } from '../support/test-app';
import { createSite, uniqueCode, waitForMessages } from './team-support';

/** Every route of a trial in the OpenAPI document, with its other path parameters filled in. */
function trialRoutes(t: TestApp, trialId: number): Array<{ method: string; path: string }> {
  const document = createOpenApiDocument(t.app);
  return Object.entries(document.paths)
    .filter(([path]) => path.startsWith('/api/trials/{trialId}'))
    .flatMap(([path, item]) =>
      Object.keys(item)
        .filter((method) => ['get', 'post', 'put', 'patch', 'delete'].includes(method))
        .map((method) => ({ method, path: path.replace('{trialId}', String(trialId)).replace(/\{[^}]+\}/g, '1') })),
    );
}

describe('Membership changes: role and sites, removal, the last investigator', () => {
  let t: TestApp;
  let lead: User;
  let grower: User;
  let reader: User;
  let leadToken: string;
  let growerToken: string;
  let readerToken: string;
  let trialId: number;
  let millbrook: number;
  let hollowLane: number;
  const members = (token = leadToken) => t.http.get(`/api/trials/${trialId}/members`).set(bearer(token));
  const change = (userId: number, body: object, token = leadToken) => t.http.patch(`/api/trials/${trialId}/members/${userId}`).set(bearer(token)).send(body);
  const remove = (userId: number, token = leadToken) => t.http.delete(`/api/trials/${trialId}/members/${userId}`).set(bearer(token));
  const activity = (kind: string) =>
    t.sequelize.query<{ summary: string }>('SELECT summary FROM activity_entries WHERE trial_id = ? AND kind = ? ORDER BY id', { replacements: [trialId, kind], type: QueryTypes.SELECT });

  beforeAll(async () => {
    t = await createTestApp();
    lead = await createPerson({ name: 'Ines Lead' });
    grower = await createPerson({ name: 'Cal Grower' });
    reader = await createPerson({ name: 'Rita Reader' });
    leadToken = await tokenFor(t, lead);
    growerToken = await tokenFor(t, grower);
    readerToken = await tokenFor(t, reader);
    const created = await t.http.post('/api/trials').set(bearer(leadToken)).send({ code: uniqueCode('MB'), title: 'Mulch on sandy beds' });
    expect(created.status).toBe(201);
    trialId = created.body.id;
    millbrook = await createSite(t.sequelize, trialId, 'Millbrook Allotments');
    hollowLane = await createSite(t.sequelize, trialId, 'Hollow Lane Garden');
    await TrialMembership.create({ trialId, userId: grower.id, role: 'collaborator', siteId: hollowLane });
    await TrialMembership.create({ trialId, userId: reader.id, role: 'reviewer', siteId: null });
  });
  afterAll(() => t.close());

  it('gives a collaborator a second site, in the trail and by e-mail to the person', async () => {
    const response = await change(grower.id, { role: 'collaborator', siteIds: [hollowLane, millbrook] });
    expect(response.status).toBe(200);
    const mine = (response.body as Member[]).filter((m) => m.userId === grower.id);
    expect(mine.map((m) => [m.role, m.siteName]).sort()).toEqual([
      ['collaborator', 'Hollow Lane Garden'],
      ['collaborator', 'Millbrook Allotments'],
    ]);
    expect(await activity('member.changed')).toEqual([
      { summary: 'Changed Cal Grower from a collaborator at Hollow Lane Garden to a collaborator at Hollow Lane Garden and Millbrook Allotments.' },
    ]);
    const [mail] = await waitForMessages(grower.email);
    expect(mail.subject).toMatch(/^Your role on the trial MB-\w+ changed$/);
    expect(mail.text).toContain('Ines Lead changed your place on the trial "Mulch on sandy beds"');
    expect(mail.text).toContain('a collaborator at Hollow Lane Garden and Millbrook Allotments');
  });

  it('refuses wrong sites by field, strangers to the team, and non-investigators', async () => {
    const noSite = await change(grower.id, { role: 'collaborator', siteIds: [] });
    expect(noSite.status).toBe(422);
    expect(noSite.body.errors).toEqual([{ field: 'siteIds', message: 'sites must name at least one site for a collaborator' }]);
    const foreign = await change(grower.id, { role: 'collaborator', siteIds: [999999] });
    expect(foreign.status).toBe(422);
    expect(foreign.body.errors[0].field).toBe('siteIds');
    const siteForReviewer = await change(reader.id, { role: 'reviewer', siteIds: [millbrook] });
    expect(siteForReviewer.status).toBe(422);
    const badRole = await change(grower.id, { role: 'owner' });
    expect(badRole.status).toBe(422);
    expect(badRole.body.errors[0].field).toBe('role');
    const stranger = await createPerson();
    expect((await change(stranger.id, { role: 'reviewer' })).status).toBe(404);
    expect((await change(reader.id, { role: 'investigator' }, growerToken)).status).toBe(403);
    expect((await remove(lead.id, readerToken)).status).toBe(403);
    expect((await members()).body.filter((m: Member) => m.userId === grower.id)).toHaveLength(2);
  });

  it('keeps at least one investigator; a role change takes effect on the very next request', async () => {
    const stepDown = await change(lead.id, { role: 'reviewer' });
    expect(stepDown.status).toBe(409);
    expect(stepDown.body.message).toBe('A trial always keeps at least one investigator: invite or name another investigator first.');
    expect((await remove(lead.id)).status).toBe(409);

    // The reviewer's token, issued before the change, can edit the protocol right after it.
    expect((await patchCurrent(t, `/api/trials/${trialId}`, bearer(readerToken), { title: 'Mulch on sandy beds (2027)' })).status).toBe(403);
    expect((await change(reader.id, { role: 'investigator' })).status).toBe(200);
    expect((await patchCurrent(t, `/api/trials/${trialId}`, bearer(readerToken), { title: 'Mulch on sandy beds (2027)' })).status).toBe(200);
    // With two investigators, one may step down to reviewer and lose the right at once.
    expect((await change(lead.id, { role: 'reviewer' }, readerToken)).status).toBe(200);
    expect((await patchCurrent(t, `/api/trials/${trialId}`, bearer(leadToken), { title: 'x' })).status).toBe(403);
    expect((await change(lead.id, { role: 'investigator' }, readerToken)).status).toBe(200);
  });

  it('removes a member: their old token gets 403 on every trial route, their data stay, the trail and an e-mail say so', async () => {
    // Something the grower wrote, attributed to them.
    const [activityId] = await t.sequelize.query(
      "INSERT INTO activity_entries (trial_id, user_id, kind, summary, details, created_at, updated_at) VALUES (?, ?, 'plot.noted', 'A note by the grower.', '{}', NOW(3), NOW(3))",
      { replacements: [trialId, grower.id], type: QueryTypes.INSERT },
    );
    expect((await t.http.get(`/api/trials/${trialId}`).set(bearer(growerToken))).status).toBe(200);
    expect((await remove(grower.id)).status).toBe(204);
    expect((await members()).body.some((m: Member) => m.userId === grower.id)).toBe(false);

    const routes = trialRoutes(t, trialId);
    expect(routes.length).toBeGreaterThan(40);
    for (const route of routes) {
      const response = await t.http[route.method as 'get'](route.path).set(bearer(growerToken)).send({});
      expect({ ...route, status: response.status }).toEqual({ ...route, status: 403 });
    }
    const refusal = await t.http.get(`/api/trials/${trialId}/plots`).set(bearer(growerToken));
    expect(refusal.body.message).toMatch(/^You were removed from this trial on \d{4}-\d{2}-\d{2}; the data you recorded stay in it under your name\.$/);
    expect((await t.http.get('/api/trials').set(bearer(growerToken))).body.some((trial: { id: number }) => trial.id === trialId)).toBe(false);

    const [kept] = await t.sequelize.query<{ userId: number }>('SELECT user_id AS userId FROM activity_entries WHERE id = ?', { replacements: [activityId], type: QueryTypes.SELECT });
    expect(kept.userId).toBe(grower.id);
    expect(await activity('member.removed')).toEqual([
      { summary: 'Removed Cal Grower (a collaborator at Hollow Lane Garden and Millbrook Allotments) from the trial; what they recorded stays under their name.' },
    ]);
    const mails = await waitForMessages(grower.email, 2);
    expect(mails[1].subject).toMatch(/^You were removed from the trial MB-\w+$/);
    expect((await remove(grower.id)).status).toBe(404);
  });

  it('refuses a deactivated account on every trial route too (401, its sessions ended)', async () => {
    const admin = await createPerson({ isAdmin: true });
    const adminToken = await tokenFor(t, admin);
    expect((await t.http.post(`/api/users/${reader.id}/deactivate`).set(bearer(adminToken))).status).toBe(200);
    for (const route of trialRoutes(t, trialId)) {
      const response = await t.http[route.method as 'get'](route.path).set(bearer(readerToken)).send({});
      expect({ ...route, status: response.status }).toEqual({ ...route, status: 401 });
    }
  });
});
