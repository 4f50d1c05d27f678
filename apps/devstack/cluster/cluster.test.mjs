// The cluster test: a three-node MariaDB Galera cluster on loopback, Redis and an object store shared by two
// API instances. Both write through node 1 while it answers, then node 2, then node 3 (one writer at a time, see
// docs/operations.md); B reads from nodes 2 and 3 as read replicas (DB_READ_HOSTS). A sign-in lockout reached
// through one instance holds on the other; a photo uploaded through one is served by the other; node 1, the
// writer, is killed (SIGKILL) while photos are being uploaded through B: every upload is either fully committed
// or refused, no row is lost, and both instances go on serving from the remaining nodes. Prints how long B took
// to serve again.
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { repoRoot } from '../src/env.mjs';
import { GaleraCluster } from '../src/galera.mjs';
import { startObjectStore } from '../src/object-store.mjs';
import { apiCommand, appEnvironment } from '../src/prepare.mjs';
import { waitForApi } from '../src/wait-for-api.mjs';

const base = appEnvironment();
const portBase = Number(base.CLUSTER_PORT_BASE || 5110);
const cluster = new GaleraCluster({ dir: resolve(repoRoot, '.data/cluster'), basePort: portBase });
const [node1, node2, node3] = cluster.nodes;
const hosts = (...nodes) => nodes.map((n) => `127.0.0.1:${n.port}`).join(',');
const redisPort = portBase + 41;
const shared = appEnvironment({
  DB_NAME: 'friable_cluster',
  DB_HOST: hosts(node1, node2, node3),
  NODE_ENV: 'production',
  DEMO_PASSWORD: 'friable-demo',
  REDIS_URL: `redis://127.0.0.1:${redisPort}/0`,
  STORAGE_BACKEND: 's3',
  S3_ENDPOINT: `http://127.0.0.1:${portBase + 42}`,
  S3_BUCKET: 'friable-cluster',
  S3_DATA_DIR: '.data/cluster-s3',
  LOGIN_MAX_FAILURES: '3',
  SMTP_PORT: '9',
  SCHEDULER_ENABLED: 'false',
  API_DOCS_PUBLIC: 'false',
});
const instances = {
  A: { port: portBase + 51, env: {} },
  B: { port: portBase + 52, env: { DB_READ_HOSTS: hosts(node2, node3) } },
};
const url = (name) => `http://127.0.0.1:${instances[name].port}`;
const jpeg = readFileSync(resolve(repoRoot, 'apps/api/e2e/photos/fixtures/jpeg-markers.jpg'));
const children = [];
let objects;
let auth;
let trial;
let roundId;
let plots;

function startApi(name) {
  const env = { ...shared, ...instances[name].env, PORT: String(instances[name].port), APP_URL: url(name) };
  const child = spawn(process.execPath, [resolve(repoRoot, 'apps/api/dist/main.js')], { env, cwd: repoRoot, stdio: ['ignore', 'ignore', 'pipe'] });
  child.stderr.on('data', (chunk) => process.stderr.write(`[API ${name}] ${chunk}`));
  children.push(child);
  return waitForApi(url(name), { seconds: 90 });
}

async function stopChild(child) {
  if (child.exitCode !== null || child.signalCode !== null) return;
  child.kill('SIGTERM');
  const ended = await Promise.race([new Promise((done) => child.once('exit', () => done(true))), sleep(10_000).then(() => false)]);
  if (!ended) child.kill('SIGKILL');
}

async function call(name, path, init = {}) {
  const response = await fetch(`${url(name)}${path}`, { ...init, headers: { ...(auth ?? {}), ...(init.headers ?? {}) } });
  const type = response.headers.get('content-type') ?? '';
  const body = type.includes('json') ? await response.json() : Buffer.from(await response.arrayBuffer());
  return { status: response.status, headers: response.headers, body };
}

const photoPath = (plotId) => `/api/trials/${trial.id}/plots/${plotId}/rounds/${roundId}/photo`;
function upload(name, plotId) {
  const form = new FormData();
  form.append('file', new Blob([jpeg], { type: 'image/jpeg' }), 'bed.jpg');
  return call(name, photoPath(plotId), { method: 'PUT', body: form }).catch((error) => ({ status: 0, body: { message: String(error) } }));
}
const photoRows = (node) =>
  cluster
    .sql(node, `SELECT plot_id, storage_key FROM ${shared.DB_NAME}.plot_photos WHERE trial_id = ${trial.id} AND round_id = ${roundId} ORDER BY plot_id`)
    .split('\n')
    .filter(Boolean)
    .map((line) => Number(line.split('\t')[0]));

beforeAll(async () => {
  const started = Date.now();
  await cluster.start();
  const password = shared.DB_PASSWORD.replace(/'/g, "\\'");
  cluster.sql(
    node1,
    `CREATE DATABASE ${shared.DB_NAME} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
     CREATE USER '${shared.DB_USER}'@'127.0.0.1' IDENTIFIED BY '${password}';
     GRANT ALL PRIVILEGES ON ${shared.DB_NAME}.* TO '${shared.DB_USER}'@'127.0.0.1';`,
  );
  const redis = spawn('/usr/bin/redis-server', ['--port', String(redisPort), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no'], { stdio: 'ignore' });
  children.push(redis);
  objects = await startObjectStore(shared, { quiet: true });
  apiCommand(shared, ['migrate', 'up']);
  apiCommand(shared, ['demo', 'load']);
  await Promise.all([startApi('A'), startApi('B')]);
  process.stdout.write(`cluster of ${cluster.clusterSize(node1)} nodes and two API instances ready in ${((Date.now() - started) / 1000).toFixed(1)} s\n`);

  const login = await call('A', '/api/auth/login', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'investigator@example.org', password: 'friable-demo' }) });
  auth = { authorization: `Bearer ${login.body.accessToken}` };
  trial = (await call('A', '/api/trials')).body.find((t) => t.code === 'FW-CLAY-26');
  roundId = (await call('A', `/api/trials/${trial.id}`)).body.rounds[0].id;
  plots = (await call('A', `/api/trials/${trial.id}/plots`)).body.map((p) => p.id);
});

afterAll(async () => {
  await Promise.all(children.map(stopChild));
  await objects?.close();
  await cluster.stop();
});

describe('Friable on a three-node Galera cluster with two API instances', () => {
  it('a sign-in lockout reached through one instance holds on the other', async () => {
    const signIn = (name, password) =>
      fetch(`${url(name)}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'hollow.lane@example.org', password }) });
    for (const name of ['A', 'B', 'A']) expect((await signIn(name, 'not the password')).status).toBe(401);
    const refused = await signIn('B', 'friable-demo');
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await refused.json()).message).toMatch(/until/i);
  });

  it('a photo uploaded through one instance is served by the other', async () => {
    const put = await upload('A', plots[0]);
    expect(put.status, JSON.stringify(put.body)).toBe(200);
    const back = await call('B', photoPath(plots[0]));
    expect(back.status).toBe(200);
    expect(Buffer.compare(back.body, jpeg)).toBe(0);
  });

  it('node 1 (the writer) killed during uploads through B: each upload committed whole or refused, no row lost, both instances serve on', async () => {
    const before = photoRows(node2);
    const targets = plots.slice(1, 13);
    const uploads = targets.map((plotId, i) => sleep(i * 80).then(() => upload('B', plotId)));
    // The kill lands once the first upload is through (so both outcomes can occur), while the others are in flight.
    await Promise.race([Promise.any(uploads.map((u) => u.then((a) => (a.status === 200 ? a : Promise.reject(a))))), sleep(5000)]).catch(() => undefined);
    const killedAt = Date.now();
    cluster.kill(node1);
    const answers = await Promise.all(uploads);

    // B writes again through node 2: the time from the kill until its health check (which follows the writer) answers.
    let recoveredAt = null;
    while (Date.now() - killedAt < 60_000) {
      const probe = await call('B', '/api/health').catch(() => ({ status: 0 }));
      if (probe.status === 200) {
        recoveredAt = Date.now();
        break;
      }
      await sleep(100);
    }
    expect(recoveredAt, 'B never served again after node 1 died').not.toBeNull();
    process.stdout.write(`failover: B answered again ${recoveredAt - killedAt} ms after node 1 was killed; uploads: ${answers.map((a) => a.status).join(' ')}\n`);

    const after = photoRows(node2);
    expect(photoRows(node3)).toEqual(after);
    for (const plotId of before) expect(after).toContain(plotId);
    for (const [i, answer] of answers.entries()) {
      const plotId = targets[i];
      if (answer.status === 200) {
        // Committed: the row is on the surviving nodes and the bytes are served by the other instance.
        expect(after).toContain(plotId);
        const back = await call('A', photoPath(plotId));
        expect(back.status).toBe(200);
        expect(Buffer.compare(back.body, jpeg)).toBe(0);
      } else {
        // Refused (503 while the node went, or the connection cut): never a half write — a row only with its bytes.
        expect([0, 500, 502, 503]).toContain(answer.status);
        if (after.includes(plotId)) {
          const back = await call('A', photoPath(plotId));
          expect(back.status).toBe(200);
          expect(Buffer.compare(back.body, jpeg)).toBe(0);
        }
      }
    }

    for (const name of ['A', 'B']) {
      expect((await call(name, '/api/health')).status).toBe(200);
      expect((await call(name, `/api/trials/${trial.id}/observations?roundId=${roundId}`)).status).toBe(200);
    }
    const again = await upload('B', plots[13]);
    expect(again.status, JSON.stringify(again.body)).toBe(200);
    expect((await call('A', photoPath(plots[13]))).status).toBe(200);
    expect(cluster.clusterSize(node2)).toBe(2);
  });
});
