import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ActivityEntryRow } from '../../src/activity/models/activity-entry.model';
import { TrialInvitation } from '../../src/invitations/models/trial-invitation.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { User } from '../../src/users/models/user.model';
import { bearer, createPerson, createTestApp, TEST_PASSWORD, tokenFor, type TestApp } from '../support/test-app';
import { createSite, linkToken, messagesTo, uniqueCode, uniqueEmail, waitForMessages } from './team-support';

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

describe('the Team: members, invitations by e-mail, accepting', () => {
  let t: TestApp;
  let investigator: User;
  let collaborator: User;
  let investigatorToken: string;
  let collaboratorToken: string;
  let reviewerToken: string;
  let outsiderToken: string;
  let trialId: number;
  let trialTitle: string;
  let millbrook: number;
  let hollowLane: number;
  let otherTrialSite: number;

  const invite = (body: object, token = investigatorToken) => t.http.post(`/api/trials/${trialId}/invitations`).set(bearer(token)).send(body);

  /** Invites a new address as collaborator at Millbrook and returns the invitation and its e-mailed token. */
  async function inviteCollaborator(email = uniqueEmail('grower')) {
    const response = await invite({ email, role: 'collaborator', siteId: millbrook });
    expect(response.status).toBe(201);
    const [message] = await waitForMessages(email);
    return { email, invitation: response.body, token: linkToken(message), message };
  }

  beforeAll(async () => {
    t = await createTestApp();
    investigator = await createPerson({ name: 'Ines Lead' });
    investigatorToken = await tokenFor(t, investigator);
    collaborator = await createPerson({ name: 'Cal Grower' });
    const reviewer = await createPerson({ name: 'Rita Reader' });
    collaboratorToken = await tokenFor(t, collaborator);
    reviewerToken = await tokenFor(t, reviewer);
    outsiderToken = await tokenFor(t, await createPerson({ name: 'Otto Outsider' }));
    trialTitle = 'Gypsum and compost on heavy clay';
    const created = await t.http.post('/api/trials').set(bearer(investigatorToken)).send({ code: uniqueCode(), title: trialTitle });
    expect(created.status).toBe(201);
    trialId = created.body.id;
    millbrook = await createSite(t.sequelize, trialId, 'Millbrook Allotments');
    hollowLane = await createSite(t.sequelize, trialId, 'Hollow Lane Garden');
    await TrialMembership.create({ trialId, userId: collaborator.id, role: 'collaborator', siteId: hollowLane });
    await TrialMembership.create({ trialId, userId: reviewer.id, role: 'reviewer', siteId: null });
    const other = await t.http.post('/api/trials').set(bearer(outsiderToken)).send({ code: uniqueCode(), title: 'Another trial' });
    otherTrialSite = await createSite(t.sequelize, other.body.id, 'Elsewhere');
  });
  afterAll(() => t.close());

  it('e-mails an invitation whose link works exactly once, creating the membership with its site and recording it', async () => {
    const { email, invitation, token, message } = await inviteCollaborator();
    expect(invitation).toMatchObject({ email, role: 'collaborator', siteId: millbrook, siteName: 'Millbrook Allotments', invitedByName: 'Ines Lead', status: 'pending' });
    expect(new Date(invitation.expiresAt).getTime() - new Date(invitation.sentAt).getTime()).toBe(168 * 3600_000);

    // The e-mail says who, which trial, role, site, the link, the expiry and how to work safely.
    expect(message.subject).toContain('Ines Lead invites you');
    expect(message.text).toContain(trialTitle);
    expect(message.text).toContain('site collaborator');
    expect(message.text).toContain('Millbrook Allotments');
    expect(message.text).toMatch(/http:\/\/[^/]+\/invitations\/[A-Za-z0-9_-]{43}/);
    expect(message.text).toContain('expires on');
    expect(message.text).toMatch(/gloves.*compost or manure.*mask.*lift/s);
    expect(message.html).toContain(`/invitations/${token}`);

    // Only the hash is stored.
    const row = await TrialInvitation.findByPk(invitation.id, { raw: true });
    expect(row?.tokenHash).toBe(sha256(token));
    expect(JSON.stringify(row)).not.toContain(token);
    const sent = await ActivityEntryRow.findOne({ where: { trialId, kind: 'invitation.sent', siteId: millbrook, userId: investigator.id }, order: [['id', 'DESC']] });
    expect(sent?.summary).toBe(`Invited ${email} as collaborator at Millbrook Allotments.`);

    const preview = await t.http.get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({
      trialCode: expect.any(String),
      trialTitle,
      role: 'collaborator',
      siteName: 'Millbrook Allotments',
      email,
      invitedByName: 'Ines Lead',
      accountExists: false,
      expiresAt: invitation.expiresAt,
    });

    const accepted = await t.http.post(`/api/invitations/${token}/accept`).send({ name: ' Robin Ash ', password: 'a long passphrase' });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ tokenType: 'Bearer', trialId, user: { email, name: 'Robin Ash', isAdmin: false } });
    const me = await t.http.get(`/api/trials/${trialId}`).set(bearer(accepted.body.accessToken));
    expect(me.status).toBe(200);
    expect(me.body.myRoles).toEqual(['collaborator']);

    const user = await User.findOne({ where: { email } });
    const memberships = await TrialMembership.findAll({ where: { trialId, userId: user!.id } });
    expect(memberships.map((m) => ({ role: m.role, siteId: m.siteId }))).toEqual([{ role: 'collaborator', siteId: millbrook }]);
    const entry = await ActivityEntryRow.findOne({ where: { trialId, kind: 'invitation.accepted', userId: user!.id } });
    expect(entry).toMatchObject({ siteId: millbrook, summary: 'Robin Ash joined as collaborator at Millbrook Allotments with a new account.' });
    expect(await TrialInvitation.findByPk(invitation.id)).toMatchObject({ acceptedBy: user!.id });

    // The second use is refused in words, and changes nothing.
    const again = await t.http.post(`/api/invitations/${token}/accept`).send({ name: 'Robin Ash', password: 'a long passphrase' });
    expect(again.status).toBe(410);
    expect(again.body.message).toBe('This invitation has already been used. Sign in to open the trial.');
    expect((await t.http.get(`/api/invitations/${token}`)).status).toBe(410);
    expect(await TrialMembership.count({ where: { trialId, userId: user!.id } })).toBe(1);

    const members = await t.http.get(`/api/trials/${trialId}/members`).set(bearer(investigatorToken));
    expect(members.body).toContainEqual(expect.objectContaining({ email, name: 'Robin Ash', role: 'collaborator', siteId: millbrook, siteName: 'Millbrook Allotments' }));
    const listed = await t.http.get(`/api/trials/${trialId}/invitations`).set(bearer(investigatorToken));
    expect(listed.body.find((i: { id: number }) => i.id === invitation.id).status).toBe('accepted');
  });

  it('refuses an expired link, and lists the invitation as expired', async () => {
    const { email, invitation, token } = await inviteCollaborator();
    await TrialInvitation.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { id: invitation.id } });
    const preview = await t.http.get(`/api/invitations/${token}`);
    expect(preview.status).toBe(410);
    expect(preview.body.message).toMatch(/^This invitation expired on \d{4}-\d{2}-\d{2}\. Ask the investigator to send it again\.$/);
    const accept = await t.http.post(`/api/invitations/${token}/accept`).send({ name: 'Late Comer', password: 'a long passphrase' });
    expect(accept.status).toBe(410);
    expect(await User.count({ where: { email } })).toBe(0);
    const listed = await t.http.get(`/api/trials/${trialId}/invitations`).set(bearer(investigatorToken));
    expect(listed.body.find((i: { id: number }) => i.id === invitation.id).status).toBe('expired');
  });

  it('refuses a revoked link and records the withdrawal', async () => {
    const { email, invitation, token } = await inviteCollaborator();
    const revoked = await t.http.delete(`/api/trials/${trialId}/invitations/${invitation.id}`).set(bearer(investigatorToken));
    expect(revoked.status).toBe(200);
    expect(revoked.body.status).toBe('revoked');
    const accept = await t.http.post(`/api/invitations/${token}/accept`).send({ name: 'Too Late', password: 'a long passphrase' });
    expect(accept.status).toBe(410);
    expect(accept.body.message).toMatch(/withdrawn by the investigator/);
    expect(await User.count({ where: { email } })).toBe(0);
    expect(await ActivityEntryRow.count({ where: { trialId, kind: 'invitation.revoked' } })).toBeGreaterThan(0);
    // A withdrawn invitation cannot be resent.
    expect((await t.http.post(`/api/trials/${trialId}/invitations/${invitation.id}/resend`).set(bearer(investigatorToken))).status).toBe(409);
  });

  it('resends with a new token and a new expiry; the old link stops working', async () => {
    const { email, invitation, token: oldToken } = await inviteCollaborator();
    await TrialInvitation.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { id: invitation.id } });
    const resent = await t.http.post(`/api/trials/${trialId}/invitations/${invitation.id}/resend`).set(bearer(investigatorToken));
    expect(resent.status).toBe(200);
    expect(resent.body).toMatchObject({ id: invitation.id, status: 'pending' });
    const messages = await waitForMessages(email, 2);
    expect(messages).toHaveLength(2);
    const newToken = linkToken(messages[1]);
    expect(newToken).not.toBe(oldToken);
    expect((await TrialInvitation.findByPk(invitation.id))?.tokenHash).toBe(sha256(newToken));

    const old = await t.http.get(`/api/invitations/${oldToken}`);
    expect(old.status).toBe(404);
    expect(old.body.message).toMatch(/^This invitation link is not valid\./);
    expect((await t.http.post(`/api/invitations/${oldToken}/accept`).send({ name: 'Old Link', password: 'a long passphrase' })).status).toBe(404);
    const accepted = await t.http.post(`/api/invitations/${newToken}/accept`).send({ name: 'New Link', password: 'a long passphrase' });
    expect(accepted.status).toBe(201);
  });

  it('lets collaborators and reviewers read the members, keeps invitations to the investigator, and hides the trial from non-members', async () => {
    const { invitation } = await inviteCollaborator();
    const routes = [
      { method: 'get', path: `/api/trials/${trialId}/members`, readable: true },
      { method: 'get', path: `/api/trials/${trialId}/invitations`, readable: false },
      { method: 'post', path: `/api/trials/${trialId}/invitations`, readable: false, body: { email: uniqueEmail('x'), role: 'reviewer' } },
      { method: 'post', path: `/api/trials/${trialId}/invitations/${invitation.id}/resend`, readable: false },
      { method: 'delete', path: `/api/trials/${trialId}/invitations/${invitation.id}`, readable: false },
    ] as const;
    const before = await TrialInvitation.count({ where: { trialId } });
    for (const route of routes) {
      const call = (token?: string) => {
        const req = t.http[route.method](route.path);
        if (token) req.set(bearer(token));
        return 'body' in route ? req.send(route.body) : req;
      };
      for (const token of [collaboratorToken, reviewerToken]) {
        const response = await call(token);
        expect({ path: route.path, method: route.method, status: response.status }).toEqual({ path: route.path, method: route.method, status: route.readable ? 200 : 403 });
      }
      expect((await call(outsiderToken)).status).toBe(404);
      expect((await call()).status).toBe(401);
    }
    expect(await TrialInvitation.count({ where: { trialId } })).toBe(before);
    expect((await TrialInvitation.findByPk(invitation.id))?.revokedAt).toBeNull();

    const members = await t.http.get(`/api/trials/${trialId}/members`).set(bearer(reviewerToken));
    expect(members.body[0]).toMatchObject({ name: 'Ines Lead', role: 'investigator', siteId: null, siteName: null });
    expect(members.body).toContainEqual(expect.objectContaining({ name: 'Cal Grower', role: 'collaborator', siteName: 'Hollow Lane Garden' }));
  });

  it('requires a site of this trial for a collaborator, and no site for other roles', async () => {
    const before = await TrialInvitation.count({ where: { trialId } });
    const email = uniqueEmail('nosite');
    const cases = [
      [{ email, role: 'collaborator' }, 'site is required for a collaborator: choose the site they will run'],
      [{ email, role: 'collaborator', siteId: otherTrialSite }, 'site must be one of this trial’s sites'],
      [{ email, role: 'reviewer', siteId: millbrook }, 'site is chosen only for a collaborator: leave it out for a reviewer or an investigator'],
    ] as const;
    for (const [body, message] of cases) {
      const response = await invite(body);
      expect(response.status).toBe(422);
      expect(response.body.errors).toEqual([{ field: 'siteId', message }]);
    }
    const bad = await invite({ email: 'not-an-address', role: 'gardener' });
    expect(bad.status).toBe(422);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['email', 'role']);
    expect(await TrialInvitation.count({ where: { trialId } })).toBe(before);
    expect(messagesTo(email)).toEqual([]);
  });

  it('refuses a second pending invitation and an invitation for a role the person already holds', async () => {
    const { email } = await inviteCollaborator();
    const twice = await invite({ email, role: 'collaborator', siteId: millbrook });
    expect(twice.status).toBe(409);
    expect(twice.body.message).toMatch(/already has a pending invitation/);
    const already = await invite({ email: collaborator.email, role: 'collaborator', siteId: hollowLane });
    expect(already.status).toBe(409);
    expect(already.body.message).toBe(`${collaborator.email} is already a collaborator at Hollow Lane Garden on this trial.`);
  });

  it('lets an existing account join with its own password, or with its bearer token', async () => {
    const existing = await createPerson({ name: 'Ada Existing' });
    const response = await invite({ email: existing.email.toUpperCase(), role: 'reviewer' });
    expect(response.status).toBe(201);
    const token = linkToken((await waitForMessages(existing.email))[0]);
    expect((await t.http.get(`/api/invitations/${token}`)).body).toMatchObject({ accountExists: true, role: 'reviewer', siteName: null });

    const wrong = await t.http.post(`/api/invitations/${token}/accept`).send({ password: 'not the password' });
    expect(wrong.status).toBe(403);
    expect(wrong.body.message).toBe(`The password is not right for the Friable account ${existing.email}.`);
    const someoneElse = await t.http.post(`/api/invitations/${token}/accept`).set(bearer(outsiderToken)).send({});
    expect(someoneElse.status).toBe(403);
    expect(someoneElse.body.message).toMatch(/but you are signed in as/);
    expect(await TrialMembership.count({ where: { trialId, userId: existing.id } })).toBe(0);

    const joined = await t.http.post(`/api/invitations/${token}/accept`).send({ password: TEST_PASSWORD, name: 'Ignored Name' });
    expect(joined.status).toBe(200);
    expect(joined.body.user).toMatchObject({ id: existing.id, name: 'Ada Existing' });
    expect(await TrialMembership.findAll({ where: { trialId, userId: existing.id }, raw: true })).toEqual([expect.objectContaining({ role: 'reviewer', siteId: null })]);

    const signedIn = await createPerson({ name: 'Bo Signed-in' });
    await invite({ email: signedIn.email, role: 'collaborator', siteId: hollowLane });
    const bearerToken = linkToken((await waitForMessages(signedIn.email))[0]);
    const withBearer = await t.http.post(`/api/invitations/${bearerToken}/accept`).set(bearer(await tokenFor(t, signedIn))).send({});
    expect(withBearer.status).toBe(200);
    expect(await TrialMembership.count({ where: { trialId, userId: signedIn.id, role: 'collaborator', siteId: hollowLane } })).toBe(1);
  });

  it('asks a new person for a name and a long enough password, creating nothing until they are right', async () => {
    const { email, token } = await inviteCollaborator();
    const short = await t.http.post(`/api/invitations/${token}/accept`).send({ name: '', password: 'short' });
    expect(short.status).toBe(422);
    expect(short.body.errors).toEqual([
      { field: 'name', message: 'name must not be empty' },
      { field: 'password', message: 'The password must be at least 12 characters long; it has 5.' },
    ]);
    expect(await User.count({ where: { email } })).toBe(0);
    expect((await t.http.get(`/api/invitations/${token}`)).status).toBe(200);
    expect((await t.http.get('/api/invitations/not-a-real-token-at-all')).status).toBe(404);
  });

  it('shows caught e-mails, newest first, in the development Outbox (administrators only)', async () => {
    const { email } = await inviteCollaborator();
    expect((await t.http.get('/api/dev/outbox').set(bearer(collaboratorToken))).status).toBe(403);
    const adminToken = await tokenFor(t, await createPerson({ isAdmin: true, name: 'Outbox reader' }));
    const outbox = await t.http.get('/api/dev/outbox').set(bearer(adminToken));
    expect(outbox.status).toBe(200);
    const times = outbox.body.map((m: { receivedAt: string }) => m.receivedAt);
    expect(times).toEqual([...times].sort().reverse());
    expect(outbox.body.find((m: { to: string[] }) => m.to.includes(email))).toMatchObject({ subject: expect.stringContaining('invites you'), html: expect.any(String) });
    expect((await t.http.get('/api/dev/outbox')).status).toBe(401);
  });
});
