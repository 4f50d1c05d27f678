import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { constants } from 'node:zlib';
import type { Plugin as PostCssPlugin } from 'postcss';
import { defineConfig } from 'vitest/config';

const lib = (name: string) => fileURLToPath(new URL(`../../libs/${name}/src/index.ts`, import.meta.url));

/**
 * Blueprint's stylesheet carries a dark theme Friable never switches on (no `bp6-dark` class): its rules
 * are dropped from the build, a tenth of the first screen's CSS.
 */
const dropDarkTheme: PostCssPlugin = {
  postcssPlugin: 'friable-drop-dark-theme',
  Rule(rule) {
    const kept = rule.selectors.filter((selector) => !/\.bp6-dark\b/.test(selector));
    if (kept.length === 0) rule.remove();
    else if (kept.length < rule.selectors.length) rule.selectors = kept;
  },
};

export default defineConfig({
  plugins: [
    react(),
    // Brotli and gzip copies beside every text file of the build (x.js.br, x.js.gz), made once here at
    // the highest levels and served by the API (apps/api/src/common/web/web-app.ts). Source maps are not served.
    compression({
      algorithms: [defineAlgorithm('brotliCompress', { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }), defineAlgorithm('gzip', { level: 9 })],
      include: /\.(js|mjs|css|html|svg|json|webmanifest|txt)$/,
      exclude: /\.map$/,
      threshold: 1024,
      logLevel: 'silent',
    }),
  ],
  resolve: {
    // The shared libraries are compiled from source into the app, not from their CommonJS builds.
    alias: {
      '@friable/contracts': lib('contracts'),
      '@friable/field': lib('field'),
      '@friable/stats': lib('stats'),
    },
  },
  css: { postcss: { plugins: [dropDarkTheme] } },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': 'http://127.0.0.1:3000' },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    // Built for error triage, never referenced from the files and never served in production.
    sourcemap: 'hidden',
    chunkSizeWarningLimit: 1500,
  },
  test: {
    include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
    environment: 'jsdom',
    setupFiles: ['src/test-setup.ts'],
    css: false,
    // Two cores shared with the other suites: a page test typing into several boxes can take seconds.
    testTimeout: 20_000,
  },
});
