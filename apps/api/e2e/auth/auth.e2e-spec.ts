import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../src/users/models/user.model';
import { TEST_PASSWORD, bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

describe('sign-in', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('returns a bearer token and the person, without the password hash', async () => {
    const person = await createPerson({ name: 'Sign-in Person' });
    await person.reload(); // the stored timestamp has whole seconds
    const response = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.tokenType).toBe('Bearer');
    expect(response.body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(response.body.expiresIn).toBe(900);
    expect(response.body.user).toEqual({
      id: person.id,
      email: person.email,
      name: 'Sign-in Person',
      isAdmin: false,
      isActive: true,
      createdAt: person.createdAt.toISOString(),
      locale: null,
      emailReminders: true,
      emailReceipts: true,
      lastSignInAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
    });
    expect(JSON.stringify(response.body)).not.toContain('$2');
  });

  it('accepts the e-mail in any letter case', async () => {
    const person = await createPerson();
    const response = await t.http.post('/api/auth/login').send({ email: person.email.toUpperCase(), password: TEST_PASSWORD });
    expect(response.status).toBe(200);
  });

  it('gives a wrong password and an unknown e-mail the same 401 answer', async () => {
    const person = await createPerson();
    const wrongPassword = await t.http.post('/api/auth/login').send({ email: person.email, password: 'not the password' });
    const unknownUser = await t.http.post('/api/auth/login').send({ email: 'nobody-here@example.org', password: TEST_PASSWORD });
    expect(wrongPassword.status).toBe(401);
    expect(unknownUser.status).toBe(401);
    expect(wrongPassword.body).toEqual(unknownUser.body);
    expect(wrongPassword.body.message).toBe('The e-mail or password is not right.');
  });

  it('answers /me for the token holder', async () => {
    const person = await createPerson();
    const token = await tokenFor(t, person);
    const response = await t.http.get('/api/auth/me').set(bearer(token));
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ id: person.id, email: person.email });
  });

  it('refuses a route without a token, and a forged token, with 401', async () => {
    const missing = await t.http.get('/api/auth/me');
    expect(missing.status).toBe(401);
    expect(missing.body).toEqual({ statusCode: 401, error: 'Unauthorized', message: 'Please sign in to continue.' });
    const forged = await t.http.get('/api/trials').set(bearer('eyJhbGciOiJIUzI1NiJ9.eyJzdWIiOjF9.c2lnbmF0dXJl'));
    expect(forged.status).toBe(401);
  });

  it('stops a deactivated person’s existing token at once', async () => {
    const admin = await createPerson({ isAdmin: true });
    const person = await createPerson();
    const token = await tokenFor(t, person);
    expect((await t.http.get('/api/auth/me').set(bearer(token))).status).toBe(200);

    const deactivated = await t.http.post(`/api/users/${person.id}/deactivate`).set(bearer(await tokenFor(t, admin)));
    expect(deactivated.status).toBe(200);
    expect(deactivated.body.isActive).toBe(false);

    const after = await t.http.get('/api/auth/me').set(bearer(token));
    expect(after.status).toBe(401);
    expect(after.body.message).toBe('Your session has ended. Please sign in again.');
    const login = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    expect(login.status).toBe(401);
    expect(login.body.message).toBe('This account is deactivated. Ask your Friable administrator to reactivate it.');
  });

  it('starts a reactivated account with no valid session: its old token stays dead', async () => {
    const adminToken = await tokenFor(t, await createPerson({ isAdmin: true }));
    const person = await createPerson();
    const token = await tokenFor(t, person);
    expect((await t.http.post(`/api/users/${person.id}/deactivate`).set(bearer(adminToken))).status).toBe(200);
    expect((await t.http.post(`/api/users/${person.id}/reactivate`).set(bearer(adminToken))).status).toBe(200);
    expect((await t.http.get('/api/auth/me').set(bearer(token))).status).toBe(401);
    expect((await t.http.get('/api/trials').set(bearer(token))).status).toBe(401);
    const fresh = await tokenFor(t, person);
    expect((await t.http.get('/api/auth/me').set(bearer(fresh))).status).toBe(200);
  });
});

describe('bad request bodies', () => {
  let t: TestApp;
  let adminToken: string;
  beforeAll(async () => {
    t = await createTestApp();
    adminToken = await tokenFor(t, await createPerson({ isAdmin: true }));
  });
  afterAll(() => t.close());

  async function usersCount() {
    return User.count();
  }

  it('answers malformed JSON with 400 in plain words, without parser internals', async () => {
    const before = await usersCount();
    const response = await t.http
      .post('/api/users')
      .set(bearer(adminToken))
      .set('Content-Type', 'application/json')
      .send('{"email": "x@example.org", ');
    expect(response.status).toBe(400);
    expect(response.body).toEqual({ statusCode: 400, error: 'Bad Request', message: 'The request body is not valid JSON.' });
    expect(await usersCount()).toBe(before);
  });

  it('names an unknown field with 422 and writes nothing', async () => {
    const before = await usersCount();
    const response = await t.http
      .post('/api/users')
      .set(bearer(adminToken))
      .send({ email: 'unknown-field@example.org', name: 'U', password: 'long enough password', role: 'admin' });
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'role', message: 'role is not a known field' }]);
    expect(await usersCount()).toBe(before);
  });

  it('names fields of the wrong type with 422', async () => {
    const response = await t.http.post('/api/users').set(bearer(adminToken)).send({ email: 42, name: ['a'], password: 'long enough password', isAdmin: 'yes' });
    expect(response.status).toBe(422);
    const fields = new Set(response.body.errors.map((e: { field: string }) => e.field));
    expect(fields).toEqual(new Set(['email', 'name', 'isAdmin']));
    expect(response.body.message).toMatch(/^Please correct: /);
  });

  it('refuses over-long strings with 422 naming the field, and writes nothing', async () => {
    const before = await usersCount();
    const response = await t.http
      .post('/api/users')
      .set(bearer(adminToken))
      .send({ email: 'long-name@example.org', name: 'n'.repeat(121), password: 'long enough password' });
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([{ field: 'name', message: 'name must be shorter than or equal to 120 characters' }]);
    expect(await usersCount()).toBe(before);
    expect(await User.count({ where: { email: 'long-name@example.org' } })).toBe(0);
  });

  it('never shows a stack trace or SQL for an unknown route', async () => {
    const response = await t.http.get('/api/no-such-thing').set(bearer(adminToken));
    expect(response.status).toBe(404);
    expect(JSON.stringify(response.body)).not.toMatch(/at \w+ \(|SELECT|\/work\//);
  });
});
