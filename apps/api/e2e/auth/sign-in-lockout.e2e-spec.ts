import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SignInLockout } from '../../src/auth/models/sign-in-lockout.model';
import { TEST_PASSWORD, createPerson, createTestApp, type TestApp } from '../support/test-app';

/** Runs `body` with these environment variables set for the app instances it creates, then restores them. */
async function withEnvironment<T>(values: Record<string, string>, body: () => Promise<T>): Promise<T> {
  const saved = Object.fromEntries(Object.keys(values).map((name) => [name, process.env[name]]));
  Object.assign(process.env, values);
  try {
    return await body();
  } finally {
    for (const [name, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  }
}

const LOCK_MESSAGE = /^Too many failed sign-in attempts for this account\. Sign-in is locked until \d\d:\d\d:\d\d UTC \(in \d+ seconds?\), even with the right password\./;

describe('sign-in lockout per account', () => {
  let behindProxy: TestApp;
  let secondInstance: TestApp;
  beforeAll(async () => {
    // Both instances trust loopback as a proxy, so each attempt can come "from" its own address.
    await withEnvironment({ TRUST_PROXY: 'loopback' }, async () => {
      behindProxy = await createTestApp();
      secondInstance = await createTestApp();
    });
  });
  afterAll(async () => {
    await SignInLockout.destroy({ where: {} });
    await behindProxy.close();
    await secondInstance.close();
  });

  it('locks an account after 5 failures from 5 addresses, refuses the right password with Retry-After and the time, on every instance', async () => {
    const person = await createPerson();
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const response = await behindProxy.http
        .post('/api/auth/login')
        .set('X-Forwarded-For', `203.0.113.${attempt}`)
        .send({ email: person.email, password: `wrong guess ${attempt}` });
      expect(response.status, `attempt ${attempt}`).toBe(401);
    }
    const right = await behindProxy.http.post('/api/auth/login').set('X-Forwarded-For', '203.0.113.99').send({ email: person.email, password: TEST_PASSWORD });
    expect(right.status).toBe(429);
    expect(right.body.message).toMatch(LOCK_MESSAGE);
    expect(Number(right.headers['retry-after'])).toBeGreaterThanOrEqual(55);
    expect(Number(right.headers['retry-after'])).toBeLessThanOrEqual(60);
    expect(right.body.accessToken).toBeUndefined();

    // The lockout lives in the database, so another API instance refuses too.
    const elsewhere = await secondInstance.http.post('/api/auth/login').set('X-Forwarded-For', '198.51.100.7').send({ email: person.email, password: TEST_PASSWORD });
    expect(elsewhere.status).toBe(429);
    const row = await SignInLockout.findByPk(`account:${person.email}`);
    expect(row?.failures).toBe(5);
    expect(row?.lockedUntil?.getTime()).toBeGreaterThan(Date.now());
  });

  it('grows the delay with each failure after a lockout, and a right password afterwards clears the count', async () => {
    const person = await createPerson();
    const subject = `account:${person.email}`;
    const fail = (n: number) => behindProxy.http.post('/api/auth/login').set('X-Forwarded-For', `192.0.2.${n}`).send({ email: person.email, password: 'wrong guess' });
    for (let n = 1; n <= 5; n += 1) expect((await fail(n)).status).toBe(401);
    const lockSeconds = async () => {
      const row = await SignInLockout.findByPk(subject);
      return Math.round((row!.lockedUntil!.getTime() - row!.lastFailureAt!.getTime()) / 1000);
    };
    expect(await lockSeconds()).toBe(60);
    // Time passes: the lockout is over, the count is not.
    await SignInLockout.update({ lockedUntil: new Date(Date.now() - 1000) }, { where: { subject } });
    expect((await fail(6)).status).toBe(401);
    expect(await lockSeconds()).toBe(120);
    await SignInLockout.update({ lockedUntil: new Date(Date.now() - 1000) }, { where: { subject } });
    expect((await fail(7)).status).toBe(401);
    expect(await lockSeconds()).toBe(240);
    const refused = await fail(8);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(200);

    await SignInLockout.update({ lockedUntil: new Date(Date.now() - 1000) }, { where: { subject } });
    const right = await behindProxy.http.post('/api/auth/login').set('X-Forwarded-For', '192.0.2.50').send({ email: person.email, password: TEST_PASSWORD });
    expect(right.status).toBe(200);
    expect(await SignInLockout.findByPk(subject)).toBeNull();
  });

  it('counts an address that does not exist like any other, so the answer does not tell', async () => {
    const email = `nobody-${Date.now()}@example.org`;
    for (let n = 1; n <= 5; n += 1) {
      expect((await behindProxy.http.post('/api/auth/login').set('X-Forwarded-For', `192.0.2.${100 + n}`).send({ email, password: 'guess' })).status).toBe(401);
    }
    const sixth = await behindProxy.http.post('/api/auth/login').set('X-Forwarded-For', '192.0.2.120').send({ email, password: 'guess' });
    expect(sixth.status).toBe(429);
    expect(sixth.body.message).toMatch(LOCK_MESSAGE);
  });

  it('counts sign-ins to several accounts from one address at the same moment without failing any (no deadlock on the shared address row)', async () => {
    const people = await Promise.all([1, 2].map(() => createPerson()));
    const stamp = Date.now();
    const attempts = [
      ...Array.from({ length: 8 }, (_, n) => ({ email: `parallel-${stamp}-${n}@example.org`, password: 'not the password' })),
      ...people.map((person) => ({ email: person.email, password: TEST_PASSWORD })),
    ];
    const answers = await Promise.all(
      attempts.map((body, n) => (n % 2 ? secondInstance : behindProxy).http.post('/api/auth/login').set('X-Forwarded-For', '198.51.100.77').send(body)),
    );
    expect(answers.map((answer) => answer.status)).toEqual([...Array(8).fill(401), 200, 200]);
    // Ten attempts were counted for the address, less the two that proved themselves right.
    expect((await SignInLockout.findByPk('address:198.51.100.77'))?.failures).toBe(8);
  });
});

describe('sign-in lockout per address, and X-Forwarded-For', () => {
  let direct: TestApp;
  beforeAll(async () => {
    await withEnvironment({ TRUST_PROXY: '', LOGIN_ADDRESS_MAX_FAILURES: '4' }, async () => {
      direct = await createTestApp();
    });
  });
  afterAll(async () => {
    await SignInLockout.destroy({ where: {} });
    await direct.close();
  });

  it('ignores a spoofed X-Forwarded-For without TRUST_PROXY: failures over many accounts lock the real address', async () => {
    const people = await Promise.all([1, 2, 3, 4, 5].map(() => createPerson()));
    for (let n = 0; n < 4; n += 1) {
      const response = await direct.http.post('/api/auth/login').set('X-Forwarded-For', `203.0.113.${n + 10}`).send({ email: people[n].email, password: 'wrong guess' });
      expect(response.status, `guess ${n + 1}`).toBe(401);
    }
    const next = await direct.http.post('/api/auth/login').set('X-Forwarded-For', '203.0.113.77').send({ email: people[4].email, password: TEST_PASSWORD });
    expect(next.status).toBe(429);
    expect(next.body.message).toMatch(/^Too many failed sign-in attempts for your address\. Sign-in is locked until /);
    expect(Number(next.headers['retry-after'])).toBeGreaterThan(0);
    const rows = await SignInLockout.findAll();
    expect(rows.some((r) => r.subject.includes('203.0.113'))).toBe(false);
  });
});

describe('Retry-After on every 429', () => {
  let limited: TestApp;
  beforeAll(async () => {
    await withEnvironment({ RATE_LIMIT_PER_MINUTE: '2' }, async () => {
      limited = await createTestApp();
    });
  });
  afterAll(() => limited.close());

  it('sends Retry-After when the flood limit answers 429', async () => {
    const statuses: number[] = [];
    let last;
    for (let i = 0; i < 3; i += 1) {
      last = await limited.http.get('/api/health');
      statuses.push(last.status);
    }
    expect(statuses).toEqual([200, 200, 429]);
    expect(Number(last!.headers['retry-after'])).toBeGreaterThan(0);
  });
});
