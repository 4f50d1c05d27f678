import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { loadEnvironment, repoRoot } from '../../devstack/src/env.mjs';

let api: ChildProcess | undefined;

/** Starts the built API (which serves the built web app) on the test port against the test database. */
export async function setup(): Promise<void> {
  const base = loadEnvironment();
  const port = process.env.PORT && process.env.NODE_ENV === 'test' ? process.env.PORT : (base.TEST_PORT ?? '3999');
  const env: NodeJS.ProcessEnv = {
    ...base,
    ...process.env,
    DB_NAME: process.env.NODE_ENV === 'test' ? (process.env.DB_NAME ?? base.DB_TEST_NAME) : base.DB_TEST_NAME,
    PORT: port,
    APP_URL: `http://127.0.0.1:${port}`,
    NODE_ENV: 'test',
  };
  if (!env.JWT_SECRET) env.JWT_SECRET = 'browser-tests-only-secret-0123456789abcdef';
  const main = resolve(repoRoot, 'apps/api/dist/main.js');
  if (!existsSync(main) || !existsSync(resolve(repoRoot, 'apps/web/dist/index.html'))) {
    throw new Error('Build the API and the web app first (npm test does this).');
  }
  // A server already answering there (an API left over from an interrupted run) would be tested in place of this build.
  const leftover = await fetch(`http://127.0.0.1:${port}/api/health`).then(
    () => true,
    () => false,
  );
  if (leftover) throw new Error(`port ${port} already has a server (an API left over from an interrupted run?); stop it, or set TEST_PORT, and run again`);
  api = spawn(process.execPath, [main], { env, stdio: ['ignore', 'ignore', 'inherit'] });
  process.env.FRIABLE_BROWSER_BASE_URL = `http://127.0.0.1:${port}`;
  for (let attempt = 0; attempt < 120; attempt += 1) {
    try {
      const response = await fetch(`http://127.0.0.1:${port}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    if (api.exitCode !== null) throw new Error(`the API exited with ${api.exitCode} before it was ready`);
    await sleep(250);
  }
  throw new Error(`the API did not answer on port ${port}`);
}

export async function teardown(): Promise<void> {
  if (api && api.exitCode === null) {
    api.kill('SIGTERM');
    await new Promise((done) => api?.once('exit', done));
  }
}
