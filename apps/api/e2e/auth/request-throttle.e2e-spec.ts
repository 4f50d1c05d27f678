import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEST_PASSWORD, createPerson, createTestApp, type TestApp } from '../support/test-app';

// @nestjs/throttler per client address: a low limit for this app instance only, so the other files keep theirs.
describe('request rate limits', () => {
  let t: TestApp;
  const saved = { all: process.env.RATE_LIMIT_PER_MINUTE, login: process.env.LOGIN_ATTEMPTS_PER_MINUTE };

  beforeAll(async () => {
    process.env.RATE_LIMIT_PER_MINUTE = '8';
    process.env.LOGIN_ATTEMPTS_PER_MINUTE = '3';
    t = await createTestApp();
  });
  afterAll(async () => {
    await t.close();
    for (const [name, value] of [['RATE_LIMIT_PER_MINUTE', saved.all], ['LOGIN_ATTEMPTS_PER_MINUTE', saved.login]] as const) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  });

  it('limits sign-in attempts per minute, right passwords included, with 429 in words', async () => {
    const person = await createPerson();
    for (let attempt = 1; attempt <= 3; attempt += 1) {
      const ok = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
      expect(ok.status, `attempt ${attempt}`).toBe(200);
    }
    const fourth = await t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    expect(fourth.status).toBe(429);
    expect(fourth.body).toEqual({ statusCode: 429, error: 'Too Many Requests', message: 'Too many requests from this address. Please wait a minute and try again.' });
  });

  it('limits each route per minute', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 9; i += 1) statuses.push((await t.http.get('/api/health')).status);
    // The throttler counts per route and address: eight answers, then the ninth is refused.
    expect(statuses).toEqual([200, 200, 200, 200, 200, 200, 200, 200, 429]);
  });
});
