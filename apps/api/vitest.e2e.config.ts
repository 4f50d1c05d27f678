import swc from 'unplugin-swc';
import { defineConfig } from 'vitest/config';

// End-to-end tests against the real MariaDB test database that `npm test` prepares.
export default defineConfig({
  plugins: [swc.vite({ module: { type: 'es6' } })],
  test: {
    include: ['e2e/**/*.e2e-spec.ts'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 30_000,
    hookTimeout: 60_000,
  },
});
