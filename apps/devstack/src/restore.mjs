// npm run restore -- FOLDER [--database NAME] [--bucket NAME] [--replace]: brings a backup made by npm run backup
// back into the configured server (DB_HOST's first node over TCP): database.sql.gz into DB_NAME (or NAME), the
// photo files into the object store's bucket (or NAME; created if missing) or STORAGE_DIR. Refuses a database
// that already holds tables unless --replace. Afterwards every API instance's cached Findings are stale (the
// data stamp is replaced). Stop the API (or expect a moment of mixed data) and run `migrate up` after it if the
// code is newer than the backup.
import { spawn, spawnSync } from 'node:child_process';
import { createReadStream, existsSync, readFileSync, readdirSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createGunzip } from 'node:zlib';
import { randomBytes } from 'node:crypto';
import { fileStore, withClientOptions } from './backup-support.mjs';
import { repoRoot } from './env.mjs';
import { appEnvironment } from './prepare.mjs';
import { fail, log } from './run.mjs';

/** Runs SQL on the configured server as the configured user; answers the rows as arrays of text. */
export function query(options, database, sql) {
  const result = spawnSync('mariadb', [`--defaults-extra-file=${options}`, '--batch', '--skip-column-names', database, '-e', sql], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`MariaDB refused: ${result.stderr.trim()}`);
  return result.stdout.split('\n').filter(Boolean).map((line) => line.split('\t'));
}

/** Exact row counts of every table of the database, by name. */
export function rowCounts(options, database) {
  const tables = query(options, database, `SELECT table_name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_type = 'BASE TABLE' ORDER BY table_name`).map(([name]) => name);
  if (!tables.length) return {};
  const rows = query(options, database, tables.map((t) => `SELECT '${t}', COUNT(*) FROM \`${t}\``).join(' UNION ALL '));
  return Object.fromEntries(rows.map(([table, n]) => [table, Number(n)]));
}

const walk = (path) => (existsSync(path) ? readdirSync(path, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(join(path, e.name)) : [join(path, e.name)])) : []);

export async function restore(env, folder, { database = env.DB_NAME, bucket = env.S3_BUCKET, replace = false } = {}) {
  const dumpFile = join(folder, 'database.sql.gz');
  if (!existsSync(dumpFile)) throw new Error(`${folder} holds no database.sql.gz: is it a folder written by npm run backup?`);
  const counts = await withClientOptions(env, async (options) => {
    const tables = Number(query(options, database, 'SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = DATABASE()')[0][0]);
    if (tables > 0 && !replace) throw new Error(`database ${database} already holds ${tables} table(s); restore into an empty one, or pass --replace to overwrite them.`);
    const client = spawn('mariadb', [`--defaults-extra-file=${options}`, '--default-character-set=utf8mb4', database], { stdio: ['pipe', 'inherit', 'pipe'] });
    let errors = '';
    client.stderr.on('data', (chunk) => (errors += chunk));
    const exited = new Promise((done) => client.on('exit', done));
    await pipeline(createReadStream(dumpFile), createGunzip(), client.stdin);
    const code = await exited;
    if (code !== 0) throw new Error(`mariadb refused the dump (exit ${code}): ${errors.trim()}`);
    // Findings cached by running instances were computed from other data: a new stamp makes them stale.
    if (query(options, database, "SELECT COUNT(*) FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name = 'data_stamps'")[0][0] === '1') {
      query(options, database, `INSERT INTO data_stamps (scope, stamp, changed_at) VALUES ('all', '${randomBytes(16).toString('hex')}', UTC_TIMESTAMP(3)) ON DUPLICATE KEY UPDATE stamp = VALUES(stamp), changed_at = VALUES(changed_at)`);
    }
    return rowCounts(options, database);
  });
  const store = fileStore({ ...env, S3_BUCKET: bucket });
  await store.ensureBucket?.();
  const objectsDir = join(folder, 'objects');
  const files = walk(objectsDir);
  for (const path of files) await store.put(relative(objectsDir, path).split('\\').join('/'), readFileSync(path));
  store.close();
  return { database, tables: Object.keys(counts).length, rows: Object.values(counts).reduce((a, b) => a + b, 0), objects: files.length, objectStore: store.where };
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(repoRoot, 'apps/devstack/src/restore.mjs')) {
  const env = appEnvironment();
  const args = process.argv.slice(2);
  const option = (name) => (args.includes(name) ? args[args.indexOf(name) + 1] : undefined);
  const folder = args.find((arg, i) => !arg.startsWith('--') && !['--database', '--bucket'].includes(args[i - 1]));
  if (!folder) fail('usage: npm run restore -- FOLDER [--database NAME] [--bucket NAME] [--replace]');
  try {
    const done = await restore(env, resolve(folder), { database: option('--database') ?? env.DB_NAME, bucket: option('--bucket') ?? env.S3_BUCKET, replace: args.includes('--replace') });
    log(`restored ${done.tables} tables (${done.rows} rows) into database ${done.database} and ${done.objects} photo file(s) into ${done.objectStore}`);
  } catch (error) {
    fail(`restore failed: ${error.message}`);
  }
}
