// Intake benchmark: a 100,000-row CSV for one site and round of a scratch trial, committed through
// the real IntakeService (parse, validate, plan, batched inserts in one transaction), then the same
// rows loaded by MariaDB's own LOAD DATA LOCAL INFILE into a scratch copy of the observations table.
// Prints both times and their ratio. Not a test: run `npm run build` first, then `npm run bench:intake`
// (DB_NAME names the database; it must be migrated). Everything it creates is removed at the end.
import { createRequire } from 'node:module';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { loadEnvironment } from '../../devstack/src/env.mjs';

const ROWS = Number(process.env.BENCH_ROWS ?? 100_000);
const PLOTS_PER_BLOCK = 100;
Object.assign(process.env, { ...loadEnvironment(), ...process.env });
process.env.JWT_SECRET ||= 'bench-only-secret-that-is-long-enough-0123456789';
process.env.INTAKE_MAX_BYTES ||= String(20 * 1_048_576);

const require = createRequire(import.meta.url);
const { NestFactory } = require('@nestjs/core');
const { getConnectionToken } = require('@nestjs/sequelize');
const { QueryTypes } = require('sequelize');
const mariadb = require('mariadb');
const { AppModule } = require('../dist/app.module.js');
const { IntakeService } = require('../dist/intake/intake.service.js');

const seconds = (ms) => `${(ms / 1000).toFixed(2)} s`;
const tag = Math.random().toString(36).slice(2, 8).toUpperCase();

const app = await NestFactory.createApplicationContext(AppModule, { logger: ['error'] });
const sequelize = app.get(getConnectionToken());
const insert = (sql, replacements) => sequelize.query(sql, { replacements, type: QueryTypes.INSERT }).then(([id]) => Number(id));
const now = new Date();
let trialId = null;
const work = mkdtempSync(join(tmpdir(), 'friable-bench-'));
try {
  const userId = await insert('INSERT INTO users (email, name, password_hash, created_at, updated_at) VALUES (?, ?, ?, ?, ?)', [`bench-${tag}@example.org`, 'Bench runner', 'x', now, now]);
  trialId = await insert("INSERT INTO trials (code, title, status, created_by, created_at, updated_at) VALUES (?, 'Intake benchmark', 'active', ?, ?, ?)", [`BENCH-${tag}`, userId, now, now]);
  const treatmentIds = [];
  for (const code of ['C', 'G', 'K', 'L']) treatmentIds.push(await insert('INSERT INTO treatments (trial_id, code, name, created_at, updated_at) VALUES (?, ?, ?, ?, ?)', [trialId, code, code, now, now]));
  const measureId = await insert(
    "INSERT INTO measures (trial_id, code, name, unit, kind, plausible_min, plausible_max, hard_min, hard_max, decimals, created_at, updated_at) VALUES (?, 'WR', 'water retained', 'mL', 'continuous', 0, 1000, 0, 1000, 1, ?, ?)",
    [trialId, now, now],
  );
  const roundId = await insert("INSERT INTO assessment_rounds (trial_id, label, day_offset, created_at, updated_at) VALUES (?, 'Day 0', 0, ?, ?)", [trialId, now, now]);
  await insert('INSERT INTO round_measures (round_id, measure_id) VALUES (?, ?)', [roundId, measureId]);
  const blocks = Math.ceil(ROWS / PLOTS_PER_BLOCK);
  const siteId = await insert("INSERT INTO sites (trial_id, name, shape, blocks, label_prefix, randomized_at, created_at, updated_at) VALUES (?, 'Bench Garden', 'rectangle', ?, 'BG', ?, ?, ?)", [trialId, blocks, now, now, now]);
  const labels = [];
  for (let start = 0; start < ROWS; start += 5000) {
    const batch = [];
    for (let index = start; index < Math.min(ROWS, start + 5000); index += 1) {
      const block = Math.floor(index / PLOTS_PER_BLOCK) + 1;
      const position = (index % PLOTS_PER_BLOCK) + 1;
      const label = `BG-B${block}-P${String(position).padStart(3, '0')}`;
      labels.push(label);
      batch.push([trialId, siteId, block, position, treatmentIds[index % 4], label, now, now]);
    }
    await sequelize.query(`INSERT INTO plots (trial_id, site_id, block, position, treatment_id, label, created_at, updated_at) VALUES ${batch.map(() => '(?,?,?,?,?,?,?,?)').join(',')}`, {
      replacements: batch.flat(),
      type: QueryTypes.INSERT,
    });
  }
  // Values with one decimal, as typed on a data sheet: 50.0 to 449.9 mL.
  const values = labels.map((_, index) => `${50 + (index * 37) % 400}.${index % 10}`);
  const csv = Buffer.from(`plot label,water retained (mL)\r\n${labels.map((label, index) => `${label},${values[index]}\r\n`).join('')}`);

  const intake = app.get(IntakeService);
  const access = { trialId, roles: ['investigator'], siteIds: [], adminReadOnly: false };
  const user = { id: userId, email: `bench-${tag}@example.org`, name: 'Bench runner', isAdmin: false };
  const started = performance.now();
  const result = await intake.intake(access, user, siteId, roundId, { bytes: csv, fileName: 'bench.csv' }, { dryRun: false, acceptWarnings: true, receipt: false });
  const intakeMs = performance.now() - started;
  const [{ n }] = await sequelize.query('SELECT COUNT(*) AS n FROM observations WHERE trial_id = ?', { replacements: [trialId], type: QueryTypes.SELECT });
  if (Number(n) !== ROWS || result.created !== ROWS) throw new Error(`expected ${ROWS} observations, found ${n} (created ${result.created})`);

  // The same rows, by MariaDB's bulk loader, into a scratch table shaped like observations (no foreign keys).
  const plotIds = await sequelize.query('SELECT id FROM plots WHERE site_id = ? ORDER BY block, position', { replacements: [siteId], type: QueryTypes.SELECT });
  const stamp = now.toISOString().slice(0, 23).replace('T', ' ');
  const tsv = join(work, 'observations.tsv');
  writeFileSync(tsv, plotIds.map(({ id }, index) => [trialId, id, roundId, measureId, values[index], values[index], 0, '\\N', '\\N', 1, 'upload', userId, stamp, stamp, stamp].join('\t')).join('\n'));
  await sequelize.query('DROP TABLE IF EXISTS bench_observations_scratch');
  await sequelize.query('CREATE TABLE bench_observations_scratch LIKE observations');
  const connection = await mariadb.createConnection({
    host: process.env.DB_HOST,
    port: Number(process.env.DB_PORT),
    user: process.env.DB_USER,
    password: process.env.DB_PASSWORD,
    database: process.env.DB_NAME,
    permitLocalInfile: true,
  });
  let loadMs;
  try {
    const loadStarted = performance.now();
    await connection.beginTransaction();
    await connection.query(
      `LOAD DATA LOCAL INFILE ? INTO TABLE bench_observations_scratch FIELDS TERMINATED BY '\\t' LINES TERMINATED BY '\\n'
       (trial_id, plot_id, round_id, measure_id, value_text, value_decimal, censored, missing_reason, notes, version, source, recorded_by, recorded_at, created_at, updated_at)`,
      [tsv],
    );
    await connection.commit();
    loadMs = performance.now() - loadStarted;
    const [{ loaded }] = await connection.query('SELECT COUNT(*) AS loaded FROM bench_observations_scratch');
    if (Number(loaded) !== ROWS) throw new Error(`LOAD DATA loaded ${loaded} rows, expected ${ROWS}`);
    await connection.query('DROP TABLE bench_observations_scratch');
  } finally {
    await connection.end();
  }
  console.log(`Intake of ${ROWS.toLocaleString('en')} rows (${(csv.length / 1_048_576).toFixed(1)} MB CSV; parse, validate, plan, insert values and history in one transaction): ${seconds(intakeMs)}`);
  console.log(`LOAD DATA LOCAL INFILE of the same ${ROWS.toLocaleString('en')} rows into a scratch table: ${seconds(loadMs)}`);
  console.log(`Ratio (Intake / LOAD DATA): ${(intakeMs / loadMs).toFixed(1)}×; the issue's budget is 10 s for Intake: ${intakeMs < 10_000 ? 'met' : 'NOT met'}.`);
} finally {
  if (trialId !== null) {
    for (const table of ['observation_changes', 'observations', 'intake_uploads', 'activity_entries', 'plots', 'round_measures'].filter(Boolean)) {
      const where = table === 'round_measures' ? 'round_id IN (SELECT id FROM assessment_rounds WHERE trial_id = ?)' : 'trial_id = ?';
      await sequelize.query(`DELETE FROM ${table} WHERE ${where}`, { replacements: [trialId] });
    }
    await sequelize.query('DELETE FROM trials WHERE id = ?', { replacements: [trialId] });
    await sequelize.query('DELETE FROM users WHERE email = ?', { replacements: [`bench-${tag}@example.org`] });
  }
  await sequelize.query('DROP TABLE IF EXISTS bench_observations_scratch');
  rmSync(work, { recursive: true, force: true });
  await app.close();
}
