import { defineConfig } from 'vitest/config';

// The devstack's own small tests (plain ES modules, no build).
export default defineConfig({
  test: {
    include: ['src/**/*.test.mjs'],
    environment: 'node',
  },
});
