import { defineConfig } from 'vitest/config';

// npm run test:cluster: three MariaDB Galera nodes and two API instances on loopback (cluster/*.test.mjs).
export default defineConfig({
  test: {
    include: ['cluster/**/*.test.mjs'],
    environment: 'node',
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 180_000,
  },
});
