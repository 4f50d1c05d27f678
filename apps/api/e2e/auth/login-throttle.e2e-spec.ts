import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD, createPerson, createTestApp, type TestApp } from '../support/test-app';

// Its own app instance, so the failures counted here do not block the other files' sign-ins.
describe('sign-in rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('refuses the 6th failed attempt within a minute from one address with 429, right password or not', async () => {
    const person = await createPerson();
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const response = await t.http.post('/api/auth/login').send({ email: person.email, password: `wrong ${attempt}` });
      expect(response.status, `attempt ${attempt}`).toBe(401);
    }
    const sixth = await t.http.post('/api/auth/login').send({ email: person.email, password: 'wrong 6' });
    expect(sixth.status).toBe(429);
    expect(sixth.body.message).toMatch(/^Too many failed sign-in attempts\. Please wait \d+ seconds and try again\.$/);
    const rightPassword = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    expect(rightPassword.status).toBe(429);
  });
});
