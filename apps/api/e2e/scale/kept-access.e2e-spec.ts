import { createHmac } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { waitForMessages } from '../team/team-support';
import { bearer, createPerson, createTestApp, TEST_PASSWORD, tokenFor, type TestApp } from '../support/test-app';

/**
 * Sessions and trial roles kept in memory (auth/sessions.service.ts, trials/trial-memberships.service.ts):
 * each instance reads them once and then trusts them while the access stamp is unchanged. Every test here
 * first uses a token on instance one (so that instance holds the session and the roles), changes access
 * through instance two, and expects the very next request on instance one to be refused.
 */
describe('Kept sessions and trial roles: every change of access holds at once, on every instance', () => {
  let one: TestApp;
  let two: TestApp;
  let adminToken: string;

  /** The SQL statements sent while `run` runs (in this one process, the two instances' models share a connection pool). */
  async function statementsDuring(run: () => Promise<unknown>): Promise<string[]> {
    const seen: string[] = [];
    const all = [one.sequelize.options, two.sequelize.options] as Array<{ logging?: unknown }>;
    const saved = all.map((o) => o.logging);
    all.forEach((o, i) => (o.logging = (sql: string) => seen.push(`${i}: ${sql}`)));
    try {
      await run();
    } finally {
      all.forEach((o, i) => (o.logging = saved[i]));
    }
    return seen;
  }

  async function newTrial(investigatorToken: string): Promise<number> {
    const created = await two.http.post('/api/trials').set(bearer(investigatorToken)).send({ code: `KA-${Math.random().toString(36).slice(2, 9).toUpperCase()}`, title: 'Kept access' });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    return created.body.id as number;
  }

  const me = (token: string) => one.http.get('/api/auth/me').set(bearer(token));

  beforeAll(async () => {
    one = await createTestApp();
    two = await createTestApp();
    adminToken = await tokenFor(two, await createPerson({ isAdmin: true }));
  });
  afterAll(async () => {
    await one.close();
    await two.close();
  });

  it('keeps a session and its trial roles: a repeated request reads neither the session nor the membership again', async () => {
    const lead = await createPerson();
    const token = await tokenFor(one, lead);
    const trialId = await newTrial(token);
    const list = () => one.http.get(`/api/trials/${trialId}/members`).set(bearer(token));
    const sessionReads = (statements: string[]) => statements.filter((sql) => /FROM `user_sessions`/.test(sql));
    const roleReads = (statements: string[]) => statements.filter((sql) => /FROM `trial_memberships` AS `TrialMembership` WHERE .*`user_id` = /.test(sql));
    const first = await statementsDuring(async () => expect((await list()).status).toBe(200));
    expect(sessionReads(first)).toHaveLength(1);
    expect(roleReads(first)).toHaveLength(1);
    const second = await statementsDuring(async () => expect((await list()).status).toBe(200));
    expect(second.filter((sql) => sql.includes("FROM data_stamps WHERE scope IN ('access')"))).toHaveLength(1);
    expect(sessionReads(second)).toEqual([]);
    expect(roleReads(second)).toEqual([]);
  });

  it('signing out through another instance stops the token and the cookie on the next request', async () => {
    const person = await createPerson();
    const login = await one.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    const cookie = ((login.headers['set-cookie'] as unknown as string[]) ?? []).find((c) => c.startsWith('friable_session='))!.split(';')[0];
    const token = login.body.accessToken as string;
    expect((await me(token)).status).toBe(200);
    expect((await one.http.get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);

    expect((await two.http.post('/api/auth/logout').set(bearer(token))).status).toBe(200);
    const after = await me(token);
    expect(after.status).toBe(401);
    expect(after.body.message).toBe('Your session has ended. Please sign in again.');
    expect((await one.http.get('/api/auth/me').set('Cookie', cookie)).status).toBe(401);
  });

  it('signing out everywhere through another instance stops every kept session of the account, and no other', async () => {
    const person = await createPerson();
    const phone = await tokenFor(one, person);
    const desk = await tokenFor(one, person);
    const bystander = await tokenFor(one, await createPerson());
    for (const token of [phone, desk, bystander]) expect((await me(token)).status).toBe(200);

    expect((await two.http.post('/api/auth/logout-all').set(bearer(desk))).status).toBe(200);
    expect((await me(phone)).status).toBe(401);
    expect((await me(desk)).status).toBe(401);
    expect((await me(bystander)).status).toBe(200);
  });

  it('a password reset through another instance ends every kept session', async () => {
    const person = await createPerson();
    const token = await tokenFor(one, person);
    expect((await me(token)).status).toBe(200);

    expect((await two.http.post('/api/auth/password-reset').send({ email: person.email })).status).toBe(200);
    const [message] = await waitForMessages(person.email, 1);
    const secret = /\/reset-password\/([A-Za-z0-9_-]+)/.exec(message.text)![1];
    const reset = await two.http.post('/api/auth/password-reset/confirm').send({ token: secret, password: 'a fresh spring passphrase' });
    expect(reset.status, JSON.stringify(reset.body)).toBe(200);
    expect((await me(token)).status).toBe(401);
  });

  it('deactivation through another instance stops the kept session; an administrator right taken away ends read access to others’ trials', async () => {
    const person = await createPerson();
    const token = await tokenFor(one, person);
    expect((await me(token)).status).toBe(200);
    expect((await two.http.post(`/api/users/${person.id}/deactivate`).set(bearer(adminToken))).status).toBe(200);
    expect((await me(token)).status).toBe(401);

    const lead = await createPerson();
    const trialId = await newTrial(await tokenFor(two, lead));
    const admin = await createPerson({ isAdmin: true });
    const adminOnOne = await tokenFor(one, admin);
    expect((await one.http.get(`/api/trials/${trialId}`).set(bearer(adminOnOne))).status).toBe(200);
    const demoted = await two.http.patch(`/api/users/${admin.id}`).set(bearer(adminToken)).send({ isAdmin: false });
    expect(demoted.status, JSON.stringify(demoted.body)).toBe(200);
    expect((await one.http.get(`/api/trials/${trialId}`).set(bearer(adminOnOne))).status).toBe(404);
  });

  it('a member removed or demoted through another instance loses the kept role on the next request; one added gains it', async () => {
    const lead = await createPerson();
    const leadToken = await tokenFor(two, lead);
    const trialId = await newTrial(leadToken);
    const reader = await createPerson();
    const newcomer = await createPerson();
    await TrialMembership.create({ trialId, userId: reader.id, role: 'reviewer', siteId: null });
    const readerToken = await tokenFor(one, reader);
    const newcomerToken = await tokenFor(one, newcomer);

    expect((await one.http.get(`/api/trials/${trialId}/members`).set(bearer(newcomerToken))).status).toBe(404);
    expect((await one.http.get(`/api/trials/${trialId}/members`).set(bearer(readerToken))).status).toBe(200);
    expect((await one.http.get(`/api/trials/${trialId}/invitations`).set(bearer(readerToken))).status).toBe(403);

    // Promoted through two: the kept reviewer role on one gives way to investigator at once.
    expect((await two.http.patch(`/api/trials/${trialId}/members/${reader.id}`).set(bearer(leadToken)).send({ role: 'investigator' })).status).toBe(200);
    expect((await one.http.get(`/api/trials/${trialId}/invitations`).set(bearer(readerToken))).status).toBe(200);
    // Demoted again, then removed: each takes effect on the next request on one.
    expect((await two.http.patch(`/api/trials/${trialId}/members/${reader.id}`).set(bearer(leadToken)).send({ role: 'reviewer' })).status).toBe(200);
    expect((await one.http.get(`/api/trials/${trialId}/invitations`).set(bearer(readerToken))).status).toBe(403);
    expect((await two.http.delete(`/api/trials/${trialId}/members/${reader.id}`).set(bearer(leadToken))).status).toBe(204);
    const removed = await one.http.get(`/api/trials/${trialId}/members`).set(bearer(readerToken));
    expect(removed.status).toBe(403);
    expect(removed.body.message).toMatch(/^You were removed from this trial on /);

    // A membership written anywhere (here straight to the table) counts at once as well.
    await TrialMembership.create({ trialId, userId: newcomer.id, role: 'reviewer', siteId: null });
    expect((await one.http.get(`/api/trials/${trialId}/members`).set(bearer(newcomerToken))).status).toBe(200);
  });

  it('a token checked once is still refused the moment it expires', async () => {
    const person = await createPerson();
    const login = await one.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    const sid = JSON.parse(Buffer.from((login.body.accessToken as string).split('.')[1], 'base64url').toString()).sid as string;
    const now = Math.floor(Date.now() / 1000);
    const encode = (part: object) => Buffer.from(JSON.stringify(part)).toString('base64url');
    const body = `${encode({ alg: 'HS256', typ: 'JWT' })}.${encode({ sub: person.id, sid, iat: now, exp: now + 2, iss: 'friable', aud: 'friable-api' })}`;
    const shortLived = `${body}.${createHmac('sha256', process.env.JWT_SECRET as string).update(body).digest('base64url')}`;
    expect((await me(shortLived)).status).toBe(200);
    expect((await me(shortLived)).status).toBe(200);
    await sleep((now + 2) * 1000 - Date.now() + 50);
    const expired = await me(shortLived);
    expect(expired.status).toBe(401);
    expect(expired.body.message).toBe('Your session has expired. Please sign in again.');
  });
});
