// Findings benchmark: 50 concurrent clients (autocannon) against a real API process on a scratch copy of the
// demo scenario, first on GET /api/health, then on GET /api/trials/:id/findings for the demo trial's drain time
// with all sites combined, in the same run. Prints requests per second and latency percentiles of both, the
// ratio, and the time of one uncached Findings computation, beside the goals of issue #14: Findings at least
// 25 % of health's throughput with p99 at most 300 ms. Between the two rounds an observation is edited once,
// so the Findings round starts from a cache emptied by a write (the first request computes again).
// Not a test: run `npm run build` first (or npx tsc -b), then `npm run bench:findings`.
// BENCH_SECONDS (10) sets each round's length, BENCH_CONNECTIONS (50) the clients.
// Everything happens in a scratch database (<DB_NAME>_benchf) that is dropped at the end.
import { spawn } from 'node:child_process';
import { createRequire } from 'node:module';
import { resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { repoRoot } from '../../devstack/src/env.mjs';
import { apiCommand, appEnvironment, startDatabase } from '../../devstack/src/prepare.mjs';
import { waitForApi as waitForApiAt } from '../../devstack/src/wait-for-api.mjs';

const require = createRequire(import.meta.url);
const autocannon = require('autocannon');
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const CONNECTIONS = Number(process.env.BENCH_CONNECTIONS ?? 50);

const base = appEnvironment();
const env = appEnvironment({
  DB_NAME: `${base.DB_NAME}_benchf`,
  PORT: base.BENCH_PORT || '3997',
  NODE_ENV: 'production',
  SCHEDULER_ENABLED: 'false',
  DEMO_PASSWORD: 'friable-demo',
  // One address makes every request here: the flood limit would measure itself, not Findings.
  RATE_LIMIT_PER_MINUTE: '1000000',
  SMTP_PORT: '9',
});
const url = `http://127.0.0.1:${env.PORT}`;

const db = await startDatabase(env, []);
db.dropDatabase(env.DB_NAME);
db.ensureDatabase(env.DB_NAME, env.DB_USER, env.DB_PASSWORD);
apiCommand(env, ['migrate', 'up']);
apiCommand(env, ['demo', 'load']);
const api = spawn(process.execPath, [resolve(repoRoot, 'apps/api/dist/main.js')], { env, cwd: repoRoot, stdio: ['ignore', 'ignore', 'inherit'] });

const waitForApi = () => waitForApiAt(url);

async function json(path, init = {}) {
  const response = await fetch(`${url}${path}`, init);
  const body = await response.json();
  if (!response.ok) throw new Error(`${init.method ?? 'GET'} ${path}: ${response.status} ${JSON.stringify(body)}`);
  return body;
}

function load(path, headers = {}) {
  return new Promise((resolvePromise, reject) => {
    const instance = autocannon({ url: `${url}${path}`, connections: CONNECTIONS, duration: SECONDS, headers }, (error, result) => (error ? reject(error) : resolvePromise(result)));
    instance.on('error', reject);
  });
}

const line = (name, r) =>
  `${name.padEnd(9)} ${r.requests.average.toFixed(0).padStart(6)} req/s   p50 ${String(r.latency.p50).padStart(4)} ms   p99 ${String(r.latency.p99).padStart(4)} ms   ` +
  `max ${String(r.latency.max).padStart(5)} ms   ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts`;

let exitCode = 0;
try {
  await waitForApi();
  const login = await json('/api/auth/login', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: 'investigator@example.org', password: env.DEMO_PASSWORD }) });
  const auth = { authorization: `Bearer ${login.accessToken}` };
  const trials = await json('/api/trials', { headers: auth });
  const trial = trials.find((t) => t.code === 'FW-CLAY-26');
  const detail = await json(`/api/trials/${trial.id}`, { headers: auth });
  const measure = detail.measures.find((m) => m.code === 'DRAIN');
  const round = detail.rounds.find((r) => r.label === 'Day 0');
  const path = `/api/trials/${trial.id}/findings?measureId=${measure.id}&roundId=${round.id}`;

  // One write empties the cache of this trial; the next request computes, the one after is served.
  const [cell] = await json(`/api/trials/${trial.id}/observations?measureId=${measure.id}&roundId=${round.id}`, { headers: auth });
  await json(`/api/trials/${trial.id}/observations/${cell.id}`, {
    method: 'PATCH',
    headers: { ...auth, 'content-type': 'application/json' },
    body: JSON.stringify({ version: cell.version, value: cell.valueText }),
  });
  let started = performance.now();
  const computed = await json(path, { headers: auth });
  const coldMs = performance.now() - started;
  started = performance.now();
  await json(path, { headers: auth });
  const warmMs = performance.now() - started;

  process.stdout.write(`Findings benchmark: ${CONNECTIONS} concurrent clients, ${SECONDS} s each, ${computed.context.observations.length} observations (FW-CLAY-26 drain time, Day 0, all sites combined)\n`);
  const health = await load('/api/health');
  process.stdout.write(`${line('health', health)}\n`);
  const findings = await load(path, auth);
  process.stdout.write(`${line('Findings', findings)}\n`);
  const ratio = findings.requests.average / health.requests.average;
  const ratioOk = ratio >= 0.25;
  const p99Ok = findings.latency.p99 <= 300;
  const clean = findings.non2xx === 0 && findings.errors === 0 && health.non2xx === 0 && health.errors === 0;
  process.stdout.write(`one Findings computed after a write: ${coldMs.toFixed(0)} ms; then served from the cache: ${warmMs.toFixed(1)} ms\n`);
  process.stdout.write(`Findings / health throughput: ${(ratio * 100).toFixed(0)} %   (goal ≥ 25 %: ${ratioOk ? 'met' : 'NOT met'})\n`);
  process.stdout.write(`Findings p99: ${findings.latency.p99} ms   (goal ≤ 300 ms: ${p99Ok ? 'met' : 'NOT met'})\n`);
  if (!clean) process.stdout.write('some requests failed (see the counts above)\n');
  if (!ratioOk || !p99Ok || !clean) exitCode = 1;
} catch (error) {
  process.stderr.write(`${error.stack ?? error}\n`);
  exitCode = 1;
} finally {
  // Requests the clients gave up on may still be answered: let them finish before stopping.
  await sleep(2000);
  api.kill('SIGTERM');
  await new Promise((done) => (api.exitCode !== null ? done() : api.once('exit', done)));
  db.dropDatabase(env.DB_NAME);
  db.stop();
}
process.exit(exitCode);
