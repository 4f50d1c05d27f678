// npm run backup [-- --to FOLDER]: a consistent backup of the configured database and the photos.
//   FOLDER (default backups/friable-<database>-<UTC time>) receives database.sql.gz — mariadb-dump of DB_NAME in one
//   transaction (--single-transaction: InnoDB's consistent snapshot, no lock on writers) — then objects/ — every
//   photo (object storage or STORAGE_DIR) — and manifest.json. The database is dumped first, so every photo row in
//   the dump has its file (a photo uploaded during the backup may be copied without its row; it is harmless).
//   The server is the one the configuration names (.env, then the environment): DB_HOST's first node over TCP.
import { spawn } from 'node:child_process';
import { createWriteStream, mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createGzip } from 'node:zlib';
import { databaseServer, fileStore, withClientOptions } from './backup-support.mjs';
import { repoRoot } from './env.mjs';
import { appEnvironment } from './prepare.mjs';
import { fail, log } from './run.mjs';

export async function backup(env, folder) {
  mkdirSync(join(folder, 'objects'), { recursive: true });
  const started = new Date();
  await withClientOptions(env, async (options) => {
    const dump = spawn('mariadb-dump', [`--defaults-extra-file=${options}`, '--single-transaction', '--quick', '--routines', '--triggers', '--hex-blob', '--default-character-set=utf8mb4', env.DB_NAME], {
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let errors = '';
    dump.stderr.on('data', (chunk) => (errors += chunk));
    const exited = new Promise((done) => dump.on('exit', done));
    await pipeline(dump.stdout, createGzip(), createWriteStream(join(folder, 'database.sql.gz')));
    const code = await exited;
    if (code !== 0) throw new Error(`mariadb-dump failed (exit ${code}): ${errors.trim()}`);
  });
  const store = fileStore(env);
  const keys = await store.list();
  for (const key of keys) {
    const path = join(folder, 'objects', key);
    mkdirSync(dirname(path), { recursive: true });
    writeFileSync(path, await store.get(key));
  }
  store.close();
  const { host, port } = databaseServer(env);
  const manifest = { database: env.DB_NAME, server: `${host}:${port}`, objects: keys.length, objectStore: store.where, startedAt: started.toISOString(), finishedAt: new Date().toISOString() };
  writeFileSync(join(folder, 'manifest.json'), `${JSON.stringify(manifest, null, 2)}\n`);
  return manifest;
}

if (process.argv[1] && resolve(process.argv[1]) === resolve(repoRoot, 'apps/devstack/src/backup.mjs')) {
  const env = appEnvironment();
  const at = process.argv.indexOf('--to');
  const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\..*/, '');
  const folder = resolve(at > 0 ? process.argv[at + 1] : resolve(repoRoot, 'backups', `friable-${env.DB_NAME}-${stamp}`));
  try {
    const manifest = await backup(env, folder);
    log(`backed up database ${manifest.database} from ${manifest.server} and ${manifest.objects} photo file(s) from ${manifest.objectStore} into ${folder}`);
  } catch (error) {
    fail(`backup failed: ${error.message}`);
  }
}
