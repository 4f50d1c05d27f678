import { createHmac } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UserSession } from '../../src/auth/models/user-session.model';
import { TEST_PASSWORD, bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

const secret = () => process.env.JWT_SECRET as string;

/** A token signed with the real secret but shaped by the test (to prove each claim is required). */
function craftToken(header: Record<string, unknown>, payload: Record<string, unknown>, key = secret()): string {
  const encode = (part: Record<string, unknown>) => Buffer.from(JSON.stringify(part)).toString('base64url');
  const body = `${encode(header)}.${encode(payload)}`;
  const algorithm = header.alg === 'HS512' ? 'sha512' : 'sha256';
  return `${body}.${header.alg === 'none' ? '' : createHmac(algorithm, key).update(body).digest('base64url')}`;
}

function sessionCookie(response: { headers: Record<string, unknown> }): string {
  const cookies = (response.headers['set-cookie'] as string[] | undefined) ?? [];
  const cookie = cookies.find((c) => c.startsWith('friable_session='));
  if (!cookie) throw new Error(`no session cookie in ${JSON.stringify(cookies)}`);
  return cookie;
}

describe('access tokens and sessions', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('accepts only HS256 tokens that carry exp, issuer and audience, for an open session', async () => {
    const person = await createPerson();
    const login = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    const [, payloadPart] = (login.body.accessToken as string).split('.');
    const payload = JSON.parse(Buffer.from(payloadPart, 'base64url').toString()) as Record<string, unknown>;
    expect(payload).toMatchObject({ sub: person.id, iss: 'friable', aud: 'friable-api', sid: expect.any(String) });
    expect((payload.exp as number) - (payload.iat as number)).toBe(900);

    const now = Math.floor(Date.now() / 1000);
    const good = { sub: person.id, sid: payload.sid, iat: now, exp: now + 60, iss: 'friable', aud: 'friable-api' };
    expect((await t.http.get('/api/auth/me').set(bearer(craftToken({ alg: 'HS256', typ: 'JWT' }, good)))).status).toBe(200);

    const refused: Array<[string, string]> = [
      ['alg none', craftToken({ alg: 'none', typ: 'JWT' }, good)],
      ['HS512', craftToken({ alg: 'HS512', typ: 'JWT' }, good)],
      ['no exp', craftToken({ alg: 'HS256' }, { ...good, exp: undefined })],
      ['no issuer', craftToken({ alg: 'HS256' }, { ...good, iss: undefined })],
      ['other issuer', craftToken({ alg: 'HS256' }, { ...good, iss: 'elsewhere' })],
      ['no audience', craftToken({ alg: 'HS256' }, { ...good, aud: undefined })],
      ['expired', craftToken({ alg: 'HS256' }, { ...good, iat: now - 120, exp: now - 60 })],
      ['no session', craftToken({ alg: 'HS256' }, { ...good, sid: undefined })],
      ['another person’s session', craftToken({ alg: 'HS256' }, { ...good, sub: person.id + 1 })],
      ['other key', craftToken({ alg: 'HS256' }, good, 'x'.repeat(40))],
    ];
    for (const [what, token] of refused) {
      const response = await t.http.get('/api/auth/me').set(bearer(token));
      expect(response.status, what).toBe(401);
    }
  });

  it('keeps the browser’s session in an httpOnly, SameSite=Strict cookie that works without a token', async () => {
    const person = await createPerson();
    const login = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    const cookie = sessionCookie(login);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Strict/i);
    expect(cookie).toMatch(/Path=\/api/);
    expect(cookie).not.toContain(login.body.accessToken);
    const value = cookie.split(';')[0];
    const me = await t.http.get('/api/auth/me').set('Cookie', value);
    expect(me.status).toBe(200);
    expect(me.body.id).toBe(person.id);
  });

  it('refuses a cookie-signed change without the X-Friable-CSRF header, and takes it with the header', async () => {
    const person = await createPerson();
    const value = sessionCookie(await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD })).split(';')[0];
    const forged = await t.http.patch('/api/users/me').set('Cookie', value).send({ name: 'Changed by another page' });
    expect(forged.status).toBe(403);
    expect(forged.body.message).toMatch(/did not come from a Friable page/);
    await person.reload();
    expect(person.name).not.toBe('Changed by another page');
    const own = await t.http.patch('/api/users/me').set('Cookie', value).set('X-Friable-CSRF', '1').send({ name: 'Changed on purpose' });
    expect(own.status).toBe(200);
    await person.reload();
    expect(person.name).toBe('Changed on purpose');
  });

  it('signs out one session: its token and cookie stop at once, other sessions go on', async () => {
    const person = await createPerson();
    const first = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    const second = await tokenFor(t, person);
    const out = await t.http.post('/api/auth/logout').set(bearer(first.body.accessToken));
    expect(out.status).toBe(200);
    expect(sessionCookie(out)).toMatch(/friable_session=;/);
    expect((await t.http.get('/api/auth/me').set(bearer(first.body.accessToken))).status).toBe(401);
    expect((await t.http.get('/api/auth/me').set('Cookie', sessionCookie(first).split(';')[0])).status).toBe(401);
    expect((await t.http.get('/api/auth/me').set(bearer(second))).status).toBe(200);
  });

  it('signs out everywhere: every token and cookie of the account stops on the next request', async () => {
    const person = await createPerson();
    const browser = sessionCookie(await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD })).split(';')[0];
    const phone = await tokenFor(t, person);
    const desk = await tokenFor(t, person);
    const bystander = await createPerson();
    const bystanderToken = await tokenFor(t, bystander);

    const everywhere = await t.http.post('/api/auth/logout-all').set(bearer(desk));
    expect(everywhere.status).toBe(200);
    expect(everywhere.body).toEqual({ message: 'You are signed out everywhere (3 sessions ended).', sessionsEnded: 3 });
    for (const request of [
      t.http.get('/api/trials').set(bearer(phone)),
      t.http.get('/api/trials').set(bearer(desk)),
      t.http.get('/api/trials').set('Cookie', browser),
    ]) {
      expect((await request).status).toBe(401);
    }
    expect(await UserSession.count({ where: { userId: person.id, revokedAt: null } })).toBe(0);
    expect(await UserSession.count({ where: { userId: person.id, revokedReason: 'signed-out-everywhere' } })).toBe(3);
    expect((await t.http.get('/api/trials').set(bearer(bystanderToken))).status).toBe(200);
  });

  it('records the last sign-in on the account', async () => {
    const person = await createPerson();
    expect(person.lastSignInAt ?? null).toBeNull();
    const before = Date.now() - 1000;
    await tokenFor(t, person);
    await person.reload();
    expect(person.lastSignInAt!.getTime()).toBeGreaterThanOrEqual(before);
  });
});
