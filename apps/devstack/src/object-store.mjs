// The local stand-in for S3-compatible object storage: s3rver on loopback, keeping its objects in a folder.
// npm start, npm test, the API end-to-end tests and the cluster test start it as they start the SMTP sink;
// production points S3_ENDPOINT at a real object store instead.
import { mkdirSync } from 'node:fs';
import { createConnection } from 'node:net';
import { resolve } from 'node:path';
import { repoRoot } from './env.mjs';

/** The tests' object store: its own port (TEST_S3_PORT), bucket and folder, never those npm start serves from. */
export function testObjectStoreEnv(base) {
  return { S3_ENDPOINT: `http://127.0.0.1:${base.TEST_S3_PORT || '5103'}`, S3_BUCKET: 'friable-test', S3_DATA_DIR: '.data/test-s3' };
}

/** The loopback port of S3_ENDPOINT, or null when the endpoint is not a local fake (a real object store). */
export function localObjectStorePort(env) {
  if (env.STORAGE_BACKEND === 'disk' || !env.S3_ENDPOINT) return null;
  const endpoint = new URL(env.S3_ENDPOINT);
  if (!['127.0.0.1', 'localhost'].includes(endpoint.hostname)) return null;
  return Number(endpoint.port || 80);
}

/** True when something accepts connections on the loopback port. */
export function isListening(port) {
  return new Promise((done) => {
    const socket = createConnection({ host: '127.0.0.1', port });
    socket.once('connect', () => {
      socket.destroy();
      done(true);
    });
    socket.once('error', () => done(false));
  });
}

/**
 * Starts s3rver for env's S3_ENDPOINT (when it is on loopback and nothing listens there yet) with the
 * bucket S3_BUCKET, objects under S3_DATA_DIR. Resolves with { close() }; close() of a store started
 * elsewhere does nothing.
 */
export async function startObjectStore(env, { quiet = false } = {}) {
  const port = localObjectStorePort(env);
  if (port === null || (await isListening(port))) return { close: async () => {}, port };
  const directory = resolve(repoRoot, env.S3_DATA_DIR || '.data/s3');
  mkdirSync(directory, { recursive: true });
  // Imported here, not at the top: npm start and npm test load this file before they install packages.
  const { default: S3rver } = await import('s3rver');
  const server = new S3rver({
    address: '127.0.0.1',
    port,
    directory,
    silent: true,
    configureBuckets: [{ name: env.S3_BUCKET || 'friable' }],
    allowMismatchedSignatures: false,
  });
  await server.run();
  if (!quiet) process.stdout.write(`[friable] object storage (s3rver) on 127.0.0.1:${port}, objects in ${directory}\n`);
  return { close: () => server.close(), port };
}
