import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { User } from '../../src/users/models/user.model';
import { bearer, createPerson, createTestApp, TEST_PASSWORD, tokenFor, type TestApp } from '../support/test-app';
import { messagesTo, waitForMessages } from '../team/team-support';

/** The secret of the reset link in the n-th e-mail to the address (1-based), and the link itself. */
async function resetLink(email: string, n: number): Promise<{ link: string; token: string }> {
  const messages = await waitForMessages(email, n);
  const link = /\S+\/reset-password\/([A-Za-z0-9_-]+)/.exec(messages[n - 1].text);
  if (!link) throw new Error(`no reset link in: ${messages[n - 1].text}`);
  return { link: link[0], token: link[1] };
}

describe('Passwords: changing one’s own, and a forgotten one by e-mail', () => {
  let t: TestApp;
  let person: User;
  const login = (password: string) => t.http.post('/api/auth/login').send({ email: person.email, password });

  beforeAll(async () => {
    t = await createTestApp();
    person = await createPerson({ name: 'Pat Sower' });
  });
  afterAll(() => t.close());

  it('changes the password only with the current one and by the rules; other sessions end, this one goes on', async () => {
    const here = await tokenFor(t, person);
    const elsewhere = await tokenFor(t, person);
    const wrong = await t.http.post('/api/auth/password').set(bearer(here)).send({ currentPassword: 'not the password', newPassword: 'a fresh long passphrase' });
    expect(wrong.status).toBe(403);
    const common = await t.http.post('/api/auth/password').set(bearer(here)).send({ currentPassword: TEST_PASSWORD, newPassword: '1234567890' });
    expect(common.status).toBe(422);
    const short = await t.http.post('/api/auth/password').set(bearer(here)).send({ currentPassword: TEST_PASSWORD, newPassword: 'short one' });
    expect(short.status).toBe(422);
    expect((await login(TEST_PASSWORD)).status).toBe(200);

    const changed = await t.http.post('/api/auth/password').set(bearer(here)).send({ currentPassword: TEST_PASSWORD, newPassword: 'a fresh long passphrase' });
    expect(changed.status).toBe(200);
    expect((await t.http.get('/api/auth/me').set(bearer(here))).status).toBe(200);
    expect((await t.http.get('/api/auth/me').set(bearer(elsewhere))).status).toBe(401);
    expect((await login(TEST_PASSWORD)).status).toBe(401);
    expect((await login('a fresh long passphrase')).status).toBe(200);
  });

  it('answers a reset request the same for any address, and e-mails only an account’s address', async () => {
    const unknown = await t.http.post('/api/auth/password-reset').send({ email: `nobody-${person.id}@example.org` });
    const known = await t.http.post('/api/auth/password-reset').send({ email: person.email.toUpperCase() });
    expect(unknown.status).toBe(200);
    expect(known.status).toBe(200);
    expect(known.body).toEqual(unknown.body);
    const { link } = await resetLink(person.email, 1);
    expect(link).toMatch(/^https?:\/\/[^/]+\/reset-password\/[A-Za-z0-9_-]{20,100}$/);
    expect(messagesTo(`nobody-${person.id}@example.org`)).toEqual([]);
  });

  it('sets a new password from the link once, ending every session; a used, expired or unknown link is refused', async () => {
    const session = (await login('a fresh long passphrase')).body.accessToken as string;
    const { token } = await resetLink(person.email, 1);
    const weak = await t.http.post('/api/auth/password-reset/confirm').send({ token, password: '1234567890' });
    expect(weak.status).toBe(422);
    const done = await t.http.post('/api/auth/password-reset/confirm').send({ token, password: 'the river in spring' });
    expect(done.status).toBe(200);
    expect((await t.http.get('/api/auth/me').set(bearer(session))).status).toBe(401);
    expect((await login('the river in spring')).status).toBe(200);
    expect((await login('a fresh long passphrase')).status).toBe(401);

    const again = await t.http.post('/api/auth/password-reset/confirm').send({ token, password: 'another long passphrase' });
    expect(again.status).toBe(410);
    expect(again.body.message).toBe('This password-reset link was already used. Ask for a new one if you need to.');
    expect((await t.http.post('/api/auth/password-reset/confirm').send({ token: 'x'.repeat(43), password: 'another long passphrase' })).status).toBe(404);

    // A fresh link whose hour has passed.
    await t.http.post('/api/auth/password-reset').send({ email: person.email });
    const late = await resetLink(person.email, 2);
    await t.sequelize.query('UPDATE password_resets SET expires_at = NOW(3) - INTERVAL 1 MINUTE WHERE user_id = ? AND used_at IS NULL', {
      replacements: [person.id],
      type: QueryTypes.UPDATE,
    });
    const expired = await t.http.post('/api/auth/password-reset/confirm').send({ token: late.token, password: 'another long passphrase' });
    expect(expired.status).toBe(410);
    expect(expired.body.message).toBe('This password-reset link has expired. Ask for a new one on the sign-in page.');
    expect((await login('the river in spring')).status).toBe(200);
  });
});
