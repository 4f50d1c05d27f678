import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { compression, defineAlgorithm } from 'vite-plugin-compression2';
import { constants } from 'node:zlib';
import type { Plugin as PostCssPlugin } from 'postcss';
import { VitePWA } from 'vite-plugin-pwa';
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

/**
 * The service worker that keeps the app shell on the phone, so the Round walk opens without signal:
 * every built script, style and font is precached and a page address is answered with index.html.
 * Of the API only what the Round walk reads is kept (who is signed in, the trial, its plots and
 * values), network first, so a walk reloaded without signal still opens with the last known data;
 * nothing written is cached (entries wait in IndexedDB), and signing out deletes the cache
 * (lib/session.ts). Registered by lib/service-worker.ts (no inline script, so the
 * Content-Security-Policy stays as it is; worker-src 'self' allows it).
 */
const serviceWorker = VitePWA({
  injectRegister: null,
  registerType: 'autoUpdate',
  manifest: false,
  workbox: {
    globPatterns: ['**/*.{js,css,html,woff2,svg,png,ico}'],
    // Plotly's chunk (the cartesian bundle) is about 1.4 MB; the walk does not need it, but a Findings page opened offline does.
    maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    runtimeCaching: [
      {
        urlPattern: ({ url, request }) =>
          request.method === 'GET' && /^\/api\/(auth\/me|trials|trials\/\d+|trials\/\d+\/(plots|observations))$/.test(url.pathname),
        handler: 'NetworkFirst',
        options: {
          cacheName: 'friable-walk-data',
          networkTimeoutSeconds: 6,
          expiration: { maxEntries: 200, maxAgeSeconds: 14 * 24 * 3600 },
          cacheableResponse: { statuses: [200] },
        },
      },
    ],
    clientsClaim: true,
    skipWaiting: true,
  },
});

// Brotli and gzip copies beside every text file of the build (x.js.br, x.js.gz), made once here at the
// highest levels and served by the API (apps/api/src/common/web/web-app.ts). Source maps are not served.
const compressedCopies = compression({
  algorithms: [defineAlgorithm('brotliCompress', { params: { [constants.BROTLI_PARAM_QUALITY]: 11 } }), defineAlgorithm('gzip', { level: 9 })],
  include: /\.(js|mjs|css|html|svg|json|webmanifest|txt)$/,
  exclude: /\.map$/,
  threshold: 1024,
  logLevel: 'silent',
});

export default defineConfig({
  plugins: process.env.VITEST ? [react()] : [react(), compressedCopies, serviceWorker],
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
