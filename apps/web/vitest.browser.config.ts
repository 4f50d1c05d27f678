import { defineConfig } from 'vitest/config';

// Browser tests: Debian's Chromium driven by playwright-core against the built app served by the API.
export default defineConfig({
  test: {
    include: ['browser/**/*.browser.test.ts'],
    environment: 'node',
    globalSetup: ['browser/global-setup.ts'],
    fileParallelism: false,
    testTimeout: 60_000,
    hookTimeout: 90_000,
  },
});
