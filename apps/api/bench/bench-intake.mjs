// Intake benchmark: CSV files of 100,000 and 1,000,000 rows for one site and round of a scratch trial,
// uploaded over HTTP to a real API process (multipart to disk, streamed check, bulk write of values and
// history in one transaction), beside MariaDB's own LOAD DATA LOCAL INFILE of the same rows into an
// identical scratch copy of the observations table. Prints both times and their ratio, where the time
// went (the import's own stages, followed as the browser follows them), the slowest /api/health answer
// during the upload, the API process's peak memory (VmHWM), and the processor time the API and MariaDB
// spent (from /proc), which stays comparable on a machine that is busy with other work.
// 100,000 rows are measured BENCH_REPEAT times (3), alternating with LOAD DATA, and the median ratio is judged.
// Not a test: run `npm run build` first, then `npm run bench:intake`. BENCH_ROWS=100000 runs one size.
// Everything happens in a scratch database (<DB_NAME>_bench) that is dropped at the end.
import { spawn, spawnSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { createRequire } from 'node:module';
import { mkdtempSync, openAsBlob, readFileSync, rmSync, statSync, writeFileSync, createWriteStream } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { repoRoot } from '../../devstack/src/env.mjs';
import { apiCommand, appEnvironment, startDatabase } from '../../devstack/src/prepare.mjs';
import { waitForApi as waitForApiAt } from '../../devstack/src/wait-for-api.mjs';

const SIZES = process.env.BENCH_ROWS ? [Number(process.env.BENCH_ROWS)] : [100_000, 1_000_000];
const REPEAT = Number(process.env.BENCH_REPEAT ?? 3);
const PLOTS_PER_BLOCK = 100;
const require = createRequire(import.meta.url);
const mariadb = require('mariadb');
const bcrypt = require('bcryptjs');

const base = appEnvironment();
const env = appEnvironment({
  DB_NAME: `${base.DB_NAME}_bench`,
  PORT: base.BENCH_PORT || '3997',
  NODE_ENV: 'production',
  SCHEDULER_ENABLED: 'false',
  // No mail sink runs here; the receipt fails quietly after the commit, as it would with a relay down.
  SMTP_PORT: '9',
});
const url = `http://127.0.0.1:${env.PORT}`;
const seconds = (ms) => `${(ms / 1000).toFixed(2)} s`;
const rows = (n) => n.toLocaleString('en');
const megabytes = (bytes) => `${(bytes / 1_048_576).toFixed(0)} MB`;
const work = mkdtempSync(join(tmpdir(), 'friable-bench-'));

const db = await startDatabase(env, []);
db.dropDatabase(env.DB_NAME);
db.ensureDatabase(env.DB_NAME, env.DB_USER, env.DB_PASSWORD);
apiCommand(env, ['migrate', 'up']);
const connection = await mariadb.createConnection({
  host: env.DB_HOST,
  port: Number(env.DB_PORT),
  user: env.DB_USER,
  password: env.DB_PASSWORD,
  database: env.DB_NAME,
  permitLocalInfile: true,
  timezone: '+00:00',
});
const api = spawn(process.execPath, [...(process.env.BENCH_CPU_PROFILE ? ['--cpu-prof', '--cpu-prof-dir', process.env.BENCH_CPU_PROFILE] : []), resolve(repoRoot, 'apps/api/dist/main.js')], { env, cwd: repoRoot, stdio: ['ignore', 'ignore', 'inherit'] });

/** Processor seconds a process has used so far (user + system, Linux /proc). */
function cpuSeconds(pid) {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').replace(/^.*\) /, '').split(' ');
  return (Number(fields[11]) + Number(fields[12])) / 100;
}
const databasePid = Number(readFileSync(join(db.runDir, 'mariadb.pid'), 'utf8'));

/** Peak resident memory of the API process so far (Linux /proc). */
function peakMemory() {
  const status = readFileSync(`/proc/${api.pid}/status`, 'utf8');
  return Number(/VmHWM:\s+(\d+) kB/.exec(status)[1]) * 1024;
}

const waitForApi = () => waitForApiAt(url);

async function scratchTrial(size, tag) {
  const now = new Date();
  const insert = async (sql, values) => Number((await connection.query(sql, values)).insertId);
  const email = `bench-${tag}@example.org`;
  const password = 'bench-password-0123';
  const userId = await insert('INSERT INTO users (email, name, password_hash, is_admin, is_active, created_at, updated_at) VALUES (?, ?, ?, 0, 1, ?, ?)', [email, 'Bench runner', bcrypt.hashSync(password, 4), now, now]);
  const trialId = await insert("INSERT INTO trials (code, title, status, created_by, created_at, updated_at) VALUES (?, 'Intake benchmark', 'active', ?, ?, ?)", [`BENCH-${tag}`, userId, now, now]);
  await insert("INSERT INTO trial_memberships (trial_id, user_id, role, site_id, created_at, updated_at) VALUES (?, ?, 'investigator', NULL, ?, ?)", [trialId, userId, now, now]);
  const treatmentIds = [];
  for (const code of ['C', 'G', 'K', 'L']) treatmentIds.push(await insert('INSERT INTO treatments (trial_id, code, name, created_at, updated_at) VALUES (?, ?, ?, ?, ?)', [trialId, code, code, now, now]));
  const measureId = await insert(
    "INSERT INTO measures (trial_id, code, name, unit, kind, plausible_min, plausible_max, hard_min, hard_max, decimals, created_at, updated_at) VALUES (?, 'WR', 'water retained', 'mL', 'continuous', 0, 1000, 0, 1000, 1, ?, ?)",
    [trialId, now, now],
  );
  const roundId = await insert("INSERT INTO assessment_rounds (trial_id, label, day_offset, created_at, updated_at) VALUES (?, 'Day 0', 0, ?, ?)", [trialId, now, now]);
  await insert('INSERT INTO round_measures (round_id, measure_id) VALUES (?, ?)', [roundId, measureId]);
  const blocks = Math.ceil(size / PLOTS_PER_BLOCK);
  const siteId = await insert("INSERT INTO sites (trial_id, name, shape, blocks, label_prefix, randomized_at, created_at, updated_at) VALUES (?, 'Bench Garden', 'rectangle', ?, 'BG', ?, ?, ?)", [trialId, blocks, now, now, now]);
  const labelOf = (index) => `BG-B${Math.floor(index / PLOTS_PER_BLOCK) + 1}-P${String((index % PLOTS_PER_BLOCK) + 1).padStart(3, '0')}`;
  for (let start = 0; start < size; start += 5000) {
    const batch = [];
    for (let index = start; index < Math.min(size, start + 5000); index += 1) {
      batch.push(trialId, siteId, Math.floor(index / PLOTS_PER_BLOCK) + 1, (index % PLOTS_PER_BLOCK) + 1, treatmentIds[index % 4], labelOf(index), now, now);
    }
    await connection.query(`INSERT INTO plots (trial_id, site_id, block, position, treatment_id, label, created_at, updated_at) VALUES ${'(?,?,?,?,?,?,?,?),'.repeat(batch.length / 8).slice(0, -1)}`, batch);
  }
  return { email, password, userId, trialId, siteId, roundId, measureId, labelOf };
}

/** Values with one decimal, as typed on a data sheet: 50.0 to 449.9 mL. */
const valueOf = (index) => `${50 + ((index * 37) % 400)}.${index % 10}`;

async function writeFile(path, size, line) {
  const out = createWriteStream(path);
  let chunk = '';
  for (let index = 0; index < size; index += 1) {
    chunk += line(index);
    if (chunk.length > 1_000_000) {
      if (!out.write(chunk)) await new Promise((done) => out.once('drain', done));
      chunk = '';
    }
  }
  out.end(chunk);
  await new Promise((done) => out.once('finish', done));
}

async function measure(size) {
  const tag = Math.random().toString(36).slice(2, 8).toUpperCase();
  const trial = await scratchTrial(size, tag);
  const csvPath = join(work, `bench-${size}.csv`);
  await writeFile(csvPath, size, (index) => `${index === 0 ? 'plot label,water retained (mL)\r\n' : ''}${trial.labelOf(index)},${valueOf(index)}\r\n`);
  const login = await (await fetch(`${url}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: trial.email, password: trial.password }) })).json();
  const auth = { Authorization: `Bearer ${login.accessToken}` };

  // Follow the import as the browser does (four times a second), and keep asking /api/health meanwhile.
  const ticket = randomUUID();
  const stages = [];
  let healthWorst = 0;
  let healthAnswers = 0;
  let running = true;
  const follow = (async () => {
    while (running) {
      const response = await fetch(`${url}/api/trials/${trial.trialId}/intake-imports/${ticket}`, { headers: auth });
      if (response.ok) {
        const record = await response.json();
        if (stages.at(-1)?.stage !== record.stage) stages.push({ stage: record.stage, at: performance.now() });
      }
      await sleep(250);
    }
  })();
  const health = (async () => {
    while (running) {
      const asked = performance.now();
      await fetch(`${url}/api/health`);
      healthWorst = Math.max(healthWorst, performance.now() - asked);
      healthAnswers += 1;
      await sleep(250);
    }
  })();

  const form = new FormData();
  form.append('ticket', ticket);
  form.append('file', await openAsBlob(csvPath), 'bench.csv');
  const cpuBefore = { api: cpuSeconds(api.pid), db: cpuSeconds(databasePid) };
  const started = performance.now();
  const response = await fetch(`${url}/api/trials/${trial.trialId}/sites/${trial.siteId}/rounds/${trial.roundId}/intake`, { method: 'POST', headers: auth, body: form });
  const body = await response.json();
  const intakeMs = performance.now() - started;
  const intakeCpu = { api: cpuSeconds(api.pid) - cpuBefore.api, db: cpuSeconds(databasePid) - cpuBefore.db };
  running = false;
  await Promise.all([follow, health]);
  if (response.status !== 200) throw new Error(`the upload answered ${response.status}: ${JSON.stringify(body).slice(0, 500)}`);
  const [{ n }] = await connection.query('SELECT COUNT(*) AS n FROM observations WHERE trial_id = ?', [trial.trialId]);
  const [{ h }] = await connection.query('SELECT COUNT(*) AS h FROM observation_changes WHERE trial_id = ?', [trial.trialId]);
  if (Number(n) !== size || Number(h) !== size || body.created !== size) throw new Error(`expected ${size} observations and history rows, found ${n} and ${h} (created ${body.created})`);

  // The same rows, by MariaDB's bulk loader, into a scratch table shaped like observations (no foreign keys).
  const plotIds = await connection.query('SELECT id FROM plots WHERE site_id = ? ORDER BY block, position', [trial.siteId]);
  const stamp = new Date().toISOString().slice(0, 23).replace('T', ' ');
  const tsvPath = join(work, `bench-${size}.tsv`);
  await writeFile(tsvPath, size, (index) => `${[trial.trialId, plotIds[index].id, trial.roundId, trial.measureId, valueOf(index), valueOf(index), 0, '\\N', '\\N', 1, 'upload', trial.userId, stamp, stamp, stamp].join('\t')}\n`);
  await connection.query('DROP TABLE IF EXISTS bench_observations_scratch');
  await connection.query('CREATE TABLE bench_observations_scratch LIKE observations');
  // MariaDB's own command-line client sends the file (the Node driver would send it in 16 MB packets, which
  // the server joins into one and refuses above max_allowed_packet).
  const load = `START TRANSACTION; LOAD DATA LOCAL INFILE '${tsvPath}' INTO TABLE bench_observations_scratch FIELDS TERMINATED BY '\\t' LINES TERMINATED BY '\\n'
     (trial_id, plot_id, round_id, measure_id, value_text, value_decimal, censored, missing_reason, notes, version, source, recorded_by, recorded_at, created_at, updated_at); COMMIT;`;
  const loadCpuBefore = cpuSeconds(databasePid);
  const loadStarted = performance.now();
  const loaded = spawnSync('mariadb', ['--no-defaults', `--host=${env.DB_HOST}`, `--port=${env.DB_PORT}`, `--user=${env.DB_USER}`, '--local-infile=1', env.DB_NAME, '-e', load], {
    env: { ...process.env, MYSQL_PWD: env.DB_PASSWORD },
    encoding: 'utf8',
  });
  const loadMs = performance.now() - loadStarted;
  const loadCpu = cpuSeconds(databasePid) - loadCpuBefore;
  if (loaded.status !== 0) throw new Error(`LOAD DATA failed: ${loaded.stderr}`);
  const [{ arrived }] = await connection.query('SELECT COUNT(*) AS arrived FROM bench_observations_scratch');
  if (Number(arrived) !== size) throw new Error(`LOAD DATA loaded ${arrived} rows, expected ${size}`);
  await connection.query('DROP TABLE bench_observations_scratch');

  const ends = [...stages.slice(1).map((entry) => entry.at), started + intakeMs];
  const phases = [
    `sending and saving to disk ${seconds((stages[0]?.at ?? started) - started)}`,
    ...stages.filter((entry, index) => !['done', 'refused', 'failed'].includes(entry.stage) && index < ends.length).map((entry, index) => `${entry.stage} ${seconds(ends[index] - entry.at)}`),
  ];
  return { size, bytes: statSync(csvPath).size, intakeMs, loadMs, intakeCpu, loadCpu, phases, healthWorst, healthAnswers, peak: peakMemory() };
}

const results = [];
try {
  await waitForApi();
  for (const size of SIZES) {
    for (let round = 0; round < (size <= 100_000 ? REPEAT : 1); round += 1) results.push(await measure(size));
  }
} finally {
  api.kill('SIGTERM');
  await connection.end();
  db.dropDatabase(env.DB_NAME);
  db.stop();
  rmSync(work, { recursive: true, force: true });
}

for (const result of results) {
  console.log(`\n${rows(result.size)} rows (${(result.bytes / 1_048_576).toFixed(1)} MB CSV) through POST …/intake: ${seconds(result.intakeMs)} (${result.phases.join(', ')})`);
  console.log(`LOAD DATA LOCAL INFILE of the same ${rows(result.size)} rows into a scratch table: ${seconds(result.loadMs)}`);
  console.log(`Ratio (Intake / LOAD DATA): ${(result.intakeMs / result.loadMs).toFixed(2)}×; slowest /api/health during the upload: ${result.healthWorst.toFixed(0)} ms (${result.healthAnswers} answers); API peak memory so far (VmHWM): ${megabytes(result.peak)}`);
  console.log(
    `Processor time: Intake ${result.intakeCpu.api.toFixed(2)} s in the API + ${result.intakeCpu.db.toFixed(2)} s in MariaDB = ${(result.intakeCpu.api + result.intakeCpu.db).toFixed(2)} s; LOAD DATA ${result.loadCpu.toFixed(2)} s in MariaDB (${((result.intakeCpu.api + result.intakeCpu.db) / result.loadCpu).toFixed(2)}×)`,
  );
}
const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const hundreds = results.filter((result) => result.size === 100_000);
if (hundreds.length) {
  const ratio = median(hundreds.map((result) => result.intakeMs / result.loadMs));
  const time = median(hundreds.map((result) => result.intakeMs));
  const load = median(hundreds.map((result) => result.loadMs));
  console.log(
    `\nTargets for 100,000 rows (median of ${hundreds.length}): ≤ 3× LOAD DATA (${ratio.toFixed(2)}×: ${ratio <= 3 ? 'met' : 'NOT met'}), ≤ 5 s (${seconds(time)}: ${time <= 5000 ? 'met' : 'NOT met'}; LOAD DATA itself ${seconds(load)}). Load average now: ${readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ')} on ${availableParallelism()} processors.`,
  );
}
const million = results.find((result) => result.size === 1_000_000);
if (million) console.log(`Target for 1,000,000 rows: API peak memory < 400 MB (${megabytes(million.peak)}: ${million.peak < 400 * 1_048_576 ? 'met' : 'NOT met'}).`);
writeFileSync(join(repoRoot, '.data', 'bench-intake.json'), JSON.stringify(results, null, 2));
