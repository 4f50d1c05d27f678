// What npm run backup and npm run restore share: the server named by the configuration (DB_HOST's first node,
// DB_PORT, DB_USER, DB_PASSWORD — over TCP, never a guessed socket), a client options file that keeps the password
// off the command line, and the object store (or storage folder) of the photos.
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { repoRoot } from './env.mjs';

const require = createRequire(import.meta.url);

/** The writer node of DB_HOST (first entry; host[:port]). */
export function databaseServer(env) {
  const [first] = (env.DB_HOST || '127.0.0.1').split(',');
  const [host, port] = first.trim().split(':');
  return { host, port: Number(port || env.DB_PORT || 3306) };
}

/**
 * Runs `use(optionsFile)` with a temporary [client] options file (mode 0600) naming the server and the account;
 * pass it as `--defaults-extra-file=` first argument of mariadb and mariadb-dump. Removed afterwards.
 */
export async function withClientOptions(env, use) {
  const dir = mkdtempSync(join(tmpdir(), 'friable-backup-'));
  const file = join(dir, 'client.cnf');
  const { host, port } = databaseServer(env);
  const quote = (value) => `"${String(value).replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
  writeFileSync(file, `[client]\nhost=${host}\nport=${port}\nprotocol=TCP\nuser=${quote(env.DB_USER)}\npassword=${quote(env.DB_PASSWORD)}\n`, { mode: 0o600 });
  try {
    return await use(file);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The photos' store as files by key: { list(), get(key), put(key, bytes), close() } for S3 or the storage folder. */
export function fileStore(env) {
  if (env.STORAGE_BACKEND === 'disk') {
    const { existsSync, mkdirSync, readFileSync, readdirSync } = require('node:fs');
    const { dirname, relative } = require('node:path');
    const dir = resolve(repoRoot, env.STORAGE_DIR || '.data/storage');
    const walk = (path) => (existsSync(path) ? readdirSync(path, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(join(path, e.name)) : [join(path, e.name)])) : []);
    return {
      where: dir,
      list: async () => walk(dir).map((path) => relative(dir, path)),
      get: async (key) => readFileSync(join(dir, key)),
      put: async (key, bytes) => {
        mkdirSync(dirname(join(dir, key)), { recursive: true });
        writeFileSync(join(dir, key), bytes);
      },
      close: () => {},
    };
  }
  process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
  const { S3Client, ListObjectsV2Command, GetObjectCommand, PutObjectCommand, CreateBucketCommand, HeadBucketCommand } = require('@aws-sdk/client-s3');
  const client = new S3Client({
    ...(env.S3_ENDPOINT ? { endpoint: env.S3_ENDPOINT } : {}),
    region: env.S3_REGION || 'us-east-1',
    forcePathStyle: env.S3_FORCE_PATH_STYLE !== 'false',
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID || 'S3RVER', secretAccessKey: env.S3_SECRET_ACCESS_KEY || 'S3RVER' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
  const Bucket = env.S3_BUCKET || 'friable';
  return {
    where: `bucket ${Bucket}${env.S3_ENDPOINT ? ` at ${env.S3_ENDPOINT}` : ''}`,
    async list() {
      const keys = [];
      let ContinuationToken;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket, ContinuationToken }));
        keys.push(...(page.Contents ?? []).map((o) => o.Key));
        ContinuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (ContinuationToken);
      return keys;
    },
    async get(key) {
      const answer = await client.send(new GetObjectCommand({ Bucket, Key: key }));
      return Buffer.from(await answer.Body.transformToByteArray());
    },
    async put(key, bytes) {
      const type = /\.png$/i.test(key) ? 'image/png' : /\.jpe?g$/i.test(key) ? 'image/jpeg' : 'application/octet-stream';
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: bytes, ContentType: type }));
    },
    async ensureBucket() {
      try {
        await client.send(new HeadBucketCommand({ Bucket }));
      } catch {
        await client.send(new CreateBucketCommand({ Bucket }));
      }
    },
    close: () => client.destroy(),
  };
}
