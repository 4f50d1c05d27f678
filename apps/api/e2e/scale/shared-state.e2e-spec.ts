import { GetObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SharedThrottlerStorage } from '../../src/common/security/shared-throttler-storage';
import { RemindersService } from '../../src/reminders/reminders.service';
import { SchedulerLease } from '../../src/reminders/scheduler-lease';
import { readStorageConfig } from '../../src/storage/storage.config';
import { buildIntakeTrial, type IntakeTrial } from '../intake/intake-support';
import { TEST_PASSWORD, bearer, binaryBody, createPerson, createTestApp, type TestApp } from '../support/test-app';

const jpeg = readFileSync(resolve(__dirname, '../photos/fixtures/jpeg-markers.jpg'));

/** Photos in object storage, reminders elected by a lease: two API instances on one database. */
describe('Shared state: photos in object storage, one elected scheduler', () => {
  let one: TestApp;
  let two: TestApp;
  let built: IntakeTrial;

  beforeAll(async () => {
    one = await createTestApp();
    two = await createTestApp();
    built = await buildIntakeTrial(one);
  });
  afterAll(async () => {
    await one.close();
    await two.close();
  });

  it('a photo uploaded through one instance is stored as an object and served by the other', async () => {
    const path = `/api/trials/${built.trialId}/plots/${built.plots['TG-B1-P01']}/rounds/${built.roundId}/photo`;
    const put = await one.http.put(path).set(bearer(built.tokens.collaborator)).attach('file', jpeg, { filename: 'bed.jpg', contentType: 'image/jpeg' });
    expect(put.status).toBe(200);
    const back = await two.http.get(path).set(bearer(built.tokens.reviewer)).buffer(true).parse(binaryBody);
    expect(back.status).toBe(200);
    expect(Buffer.compare(back.body as Buffer, jpeg)).toBe(0);

    const [row] = await one.sequelize.query<{ key: string }>('SELECT storage_key AS `key` FROM plot_photos WHERE plot_id = ? AND round_id = ?', {
      replacements: [built.plots['TG-B1-P01'], built.roundId],
      type: QueryTypes.SELECT,
    });
    const config = readStorageConfig();
    expect(config.backend).toBe('s3');
    // Read straight from the bucket with a client of our own: the bytes are there, and not on this machine's disk.
    const client = new S3Client({ endpoint: config.s3.endpoint!, region: config.s3.region, forcePathStyle: true, credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey } });
    const object = await client.send(new GetObjectCommand({ Bucket: config.s3.bucket, Key: row!.key }));
    expect(Buffer.compare(Buffer.from(await object.Body!.transformToByteArray()), jpeg)).toBe(0);
    expect(object.ContentType).toBe('image/jpeg');
    expect(existsSync(resolve(config.dir, row!.key))).toBe(false);

    // Removed through the second instance: the object is gone too.
    const removed = await two.http.delete(path).set(bearer(built.tokens.investigator));
    expect(removed.status).toBe(204);
    await expect(client.send(new GetObjectCommand({ Bucket: config.s3.bucket, Key: row!.key }))).rejects.toMatchObject({ name: 'NoSuchKey' });
    client.destroy();
  });

  it('one instance wins the reminder lease; the other runs nothing until the lease expires', async () => {
    const name = `e2e-${Date.now()}`;
    const first = one.app.get(SchedulerLease);
    const second = two.app.get(SchedulerLease);
    expect(first.holder).not.toBe(second.holder);
    const both = await Promise.all([first.acquire(name, 1), second.acquire(name, 1)]);
    expect(both.filter(Boolean)).toHaveLength(1);
    const winner = both[0] ? first : second;
    const loser = both[0] ? second : first;
    expect(await winner.acquire(name, 1)).toBe(true);
    expect(await loser.acquire(name, 1)).toBe(false);
    await sleep(1200);
    expect(await loser.acquire(name, 60)).toBe(true);
    expect(await winner.acquire(name, 60)).toBe(false);
  });

  it('the scheduled reminder run happens on the elected instance only', async () => {
    await one.sequelize.query("DELETE FROM scheduler_leases WHERE name = 'round-reminders'");
    const now = new Date('2031-03-01T08:00:00Z');
    const runs = await Promise.all([one.app.get(RemindersService).runIfElected(now), two.app.get(RemindersService).runIfElected(now)]);
    expect(runs.filter((run) => run === null)).toHaveLength(1);
    expect(runs.find((run) => run !== null)).toMatchObject({ dueDate: '2031-03-02', failed: 0 });
    await one.sequelize.query("DELETE FROM scheduler_leases WHERE name = 'round-reminders'");
  });
});

/** Sign-in attempts per minute counted in Redis: a limit reached through one instance holds on the other. */
describe('Shared state: rate limits in Redis', () => {
  const port = Number(process.env.TEST_REDIS_PORT ?? 5104);
  const saved = { REDIS_URL: process.env.REDIS_URL, LOGIN_ATTEMPTS_PER_MINUTE: process.env.LOGIN_ATTEMPTS_PER_MINUTE };
  let redis: ChildProcess;
  let one: TestApp;
  let two: TestApp;

  const startRedis = async () => {
    if (!existsSync('/usr/bin/redis-server')) throw new Error('redis-server is missing: npm test installs it (Debian package redis-server).');
    redis = spawn('/usr/bin/redis-server', ['--port', String(port), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no'], { stdio: 'ignore' });
    for (let i = 0; i < 40; i += 1) {
      const probe = spawn('/usr/bin/redis-cli', ['-p', String(port), 'ping'], { stdio: 'ignore' });
      if ((await new Promise((done) => probe.on('exit', done))) === 0) return;
      await sleep(100);
    }
    throw new Error(`redis-server did not start on port ${port}`);
  };
  const stopRedis = async () => {
    if (redis.exitCode !== null) return;
    redis.kill('SIGTERM');
    await new Promise((done) => redis.once('exit', done));
  };

  beforeAll(async () => {
    await startRedis();
    process.env.REDIS_URL = `redis://127.0.0.1:${port}/0`;
    process.env.LOGIN_ATTEMPTS_PER_MINUTE = '6';
    one = await createTestApp();
    two = await createTestApp();
  });
  afterAll(async () => {
    await one?.close();
    await two?.close();
    await stopRedis();
    for (const [name, value] of Object.entries(saved)) {
      if (value === undefined) delete process.env[name];
      else process.env[name] = value;
    }
  });

  it('the seventh sign-in of a minute from one address is refused whichever instance it reaches', async () => {
    expect(one.app.get(SharedThrottlerStorage).usesRedis).toBe(true);
    const person = await createPerson({ name: 'Shared limit' });
    const signIn = (t: TestApp) => t.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    for (const t of [one, two, one, two, one, two]) expect((await signIn(t)).status).toBe(200);
    for (const t of [one, two]) {
      const refused = await signIn(t);
      expect(refused.status).toBe(429);
      expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    }
  });

  it('with Redis gone, instances keep answering and count on their own', async () => {
    await stopRedis();
    const health = await one.http.get('/api/health');
    expect(health.status).toBe(200);
    const person = await createPerson({ name: 'Redis gone' });
    const signIn = await two.http.post('/api/auth/login').send({ email: person.email, password: TEST_PASSWORD });
    expect([200, 429]).toContain(signIn.status);
    expect(two.app.get(SharedThrottlerStorage).usesRedis).toBe(false);
  });
});
