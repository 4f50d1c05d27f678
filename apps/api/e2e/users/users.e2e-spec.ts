import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../src/users/models/user.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

describe('user management by the instance administrator', () => {
  let t: TestApp;
  let adminToken: string;
  let personToken: string;
  beforeAll(async () => {
    t = await createTestApp();
    adminToken = await tokenFor(t, await createPerson({ isAdmin: true }));
    personToken = await tokenFor(t, await createPerson());
  });
  afterAll(() => t.close());

  it('lists people without password hashes', async () => {
    const response = await t.http.get('/api/users').set(bearer(adminToken));
    expect(response.status).toBe(200);
    expect(response.body.length).toBeGreaterThanOrEqual(2);
    for (const person of response.body) expect(Object.keys(person).sort()).toEqual(['createdAt', 'email', 'emailReceipts', 'emailReminders', 'id', 'isActive', 'isAdmin', 'lastSignInAt', 'locale', 'name']);
  });

  it('creates a person who can then sign in, storing only a hash', async () => {
    const email = `created-${Date.now()}@example.org`;
    const response = await t.http
      .post('/api/users')
      .set(bearer(adminToken))
      .send({ email: email.toUpperCase(), name: '  New Person ', password: 'a long passphrase' });
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ email, name: 'New Person', isAdmin: false, isActive: true });
    const row = await User.findOne({ where: { email } });
    expect(row?.passwordHash).toMatch(/^\$2[aby]\$12\$/);
    const login = await t.http.post('/api/auth/login').send({ email, password: 'a long passphrase' });
    expect(login.status).toBe(200);
  });

  it('answers a second account with the same e-mail with 409', async () => {
    const existing = await createPerson();
    const before = await User.count();
    const response = await t.http.post('/api/users').set(bearer(adminToken)).send({ email: existing.email, name: 'Twin', password: 'a long passphrase' });
    expect(response.status).toBe(409);
    expect(response.body.message).toBe('Another record already uses this email.');
    expect(await User.count()).toBe(before);
  });

  it('refuses a short or common password with 422 naming the field, and writes nothing', async () => {
    const before = await User.count();
    const short = await t.http.post('/api/users').set(bearer(adminToken)).send({ email: 'short-pw@example.org', name: 'S', password: '1234567890' });
    expect(short.status).toBe(422);
    expect(short.body.errors).toEqual([{ field: 'password', message: 'The password must be at least 12 characters long; it has 10.' }]);
    const common = await t.http.post('/api/users').set(bearer(adminToken)).send({ email: 'common-pw@example.org', name: 'C', password: 'qwerty123456' });
    expect(common.status).toBe(422);
    expect(common.body.errors[0].message).toMatch(/most common passwords/);
    expect(await User.count()).toBe(before);
  });

  it('deactivates and reactivates a person, and refuses to deactivate oneself', async () => {
    const person = await createPerson();
    const off = await t.http.post(`/api/users/${person.id}/deactivate`).set(bearer(adminToken));
    expect(off.status).toBe(200);
    expect((await User.findByPk(person.id))?.isActive).toBe(false);
    const on = await t.http.post(`/api/users/${person.id}/reactivate`).set(bearer(adminToken));
    expect(on.status).toBe(200);
    expect((await User.findByPk(person.id))?.isActive).toBe(true);

    const me = await t.http.get('/api/auth/me').set(bearer(adminToken));
    const self = await t.http.post(`/api/users/${me.body.id}/deactivate`).set(bearer(adminToken));
    expect(self.status).toBe(400);
    expect(self.body.message).toBe('You cannot deactivate your own account.');
  });

  it('answers an unknown person with 404', async () => {
    const response = await t.http.post('/api/users/999999999/deactivate').set(bearer(adminToken));
    expect(response.status).toBe(404);
  });

  it('refuses every user-management route to a person who is not an administrator', async () => {
    const before = await User.count();
    const list = await t.http.get('/api/users').set(bearer(personToken));
    const create = await t.http.post('/api/users').set(bearer(personToken)).send({ email: 'x-new@example.org', name: 'X', password: 'a long passphrase' });
    const deactivate = await t.http.post('/api/users/1/deactivate').set(bearer(personToken));
    for (const response of [list, create, deactivate]) {
      expect(response.status).toBe(403);
      expect(response.body.message).toBe('Only an instance administrator may do this.');
    }
    expect(await User.count()).toBe(before);
  });
});
