import swc from 'unplugin-swc';
import { defineConfig } from 'vitest/config';
// The devstack's own reader of .env.example and .env, so a standalone run sees the same settings.
import { loadEnvironment } from '../devstack/src/env.mjs';
import { testObjectStoreEnv } from '../devstack/src/object-store.mjs';

const base = loadEnvironment();

// End-to-end tests against the real MariaDB test database that `npm test` prepares
// (never the demo database: DB_NAME is the test database here).
export default defineConfig({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  test: {
    include: ['e2e/**/*.e2e-spec.ts'],
    setupFiles: ['e2e/support/setup.ts'],
    globalSetup: ['e2e/support/global-setup.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
    env: {
      ...base,
      DB_NAME: base.DB_TEST_NAME ?? 'friable_test',
      JWT_SECRET: base.JWT_SECRET || 'e2e-only-secret-that-is-long-enough-0123456789',
      NODE_ENV: 'test',
      // The tests' own object store and bucket, never the one npm start serves photos from.
      ...testObjectStoreEnv(base),
    },
  },
});
