// npm run backup and npm run restore on the test database (npm test loads the demo scenario into it first): a
// backup restored into a scratch database and a scratch bucket holds the same rows in every table and the same
// photo files. Needs the checkout's MariaDB (npm test, or npm run db:up) and starts the tests' object store.
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backup } from '../src/backup.mjs';
import { fileStore, withClientOptions } from '../src/backup-support.mjs';
import { LocalMariaDb } from '../src/mariadb.mjs';
import { startObjectStore, testObjectStoreEnv } from '../src/object-store.mjs';
import { appEnvironment } from '../src/prepare.mjs';
import { restore, rowCounts } from '../src/restore.mjs';

const base = appEnvironment();
const env = { ...base, DB_NAME: base.DB_TEST_NAME || 'friable_test', ...testObjectStoreEnv(base), STORAGE_BACKEND: 's3' };
const scratch = `${env.DB_NAME}_restore`;
const scratchBucket = `friable-restore-${randomBytes(3).toString('hex')}`;
const folder = mkdtempSync(join(tmpdir(), 'friable-backup-test-'));
const db = new LocalMariaDb(env);
const photo = randomBytes(2048);
const photoKey = `photos/backup-check/${randomBytes(4).toString('hex')}.jpg`;
let objects;

beforeAll(async () => {
  if (!db.isUp()) throw new Error('MariaDB of this checkout is not running: run npm test, or npm run db:up first.');
  objects = await startObjectStore(env, { quiet: true });
  const store = fileStore(env);
  await store.put(photoKey, photo);
  store.close();
  db.dropDatabase(scratch);
  db.ensureDatabase(scratch, env.DB_USER, env.DB_PASSWORD);
});

afterAll(async () => {
  db.dropDatabase(scratch);
  rmSync(folder, { recursive: true, force: true });
  await objects?.close();
});

describe('npm run backup, npm run restore', () => {
  it('restores into a scratch database with the same row count in every table, and the photo files into a scratch bucket', async () => {
    const manifest = await backup(env, folder);
    expect(manifest.database).toBe(env.DB_NAME);
    expect(manifest.objects).toBeGreaterThan(0);
    const done = await restore(env, folder, { database: scratch, bucket: scratchBucket });
    expect(done.objects).toBe(manifest.objects);

    await withClientOptions(env, async (options) => {
      const source = rowCounts(options, env.DB_NAME);
      const restored = rowCounts(options, scratch);
      expect(Object.keys(source).length).toBeGreaterThan(30);
      expect(source.trials).toBeGreaterThan(0);
      expect(source.observations).toBeGreaterThan(0);
      // The restore replaced the data stamp of everything: the only row allowed to differ from the source.
      const { data_stamps: _sourceStamps, ...sourceRest } = source;
      const { data_stamps: restoredStamps, ...restoredRest } = restored;
      expect(restoredRest).toEqual(sourceRest);
      expect(restoredStamps).toBeGreaterThanOrEqual(1);
    });

    const source = fileStore(env);
    const copy = fileStore({ ...env, S3_BUCKET: scratchBucket });
    expect((await copy.list()).sort()).toEqual((await source.list()).sort());
    expect(Buffer.compare(await copy.get(photoKey), photo)).toBe(0);
    source.close();
    copy.close();
  });

  it('refuses to restore over a database that holds tables, unless told to replace them', async () => {
    await expect(restore(env, folder, { database: scratch, bucket: scratchBucket })).rejects.toThrow(`database ${scratch} already holds`);
    const again = await restore(env, folder, { database: scratch, bucket: scratchBucket, replace: true });
    expect(again.tables).toBeGreaterThan(30);
  });
});
