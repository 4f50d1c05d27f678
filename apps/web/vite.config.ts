import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const lib = (name: string) => fileURLToPath(new URL(`../../libs/${name}/src/index.ts`, import.meta.url));

/**
 * The service worker that keeps the app shell on the phone, so the Round walk opens without signal:
 * every built script, style and font is precached, a page address is answered with index.html, and
 * /api is never cached (values wait in IndexedDB instead). Registered by lib/service-worker.ts (no
 * inline script, so the Content-Security-Policy stays as it is; worker-src 'self' allows it).
 */
const serviceWorker = VitePWA({
  injectRegister: null,
  registerType: 'autoUpdate',
  manifest: false,
  workbox: {
    globPatterns: ['**/*.{js,css,html,woff2,svg,png,ico}'],
    // Plotly's chunk is about 4.6 MB; the walk does not need it, but a Findings page opened offline does.
    maximumFileSizeToCacheInBytes: 8 * 1024 * 1024,
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api\//],
    cleanupOutdatedCaches: true,
    clientsClaim: true,
    skipWaiting: true,
  },
});

export default defineConfig({
  plugins: process.env.VITEST ? [react()] : [react(), serviceWorker],
  resolve: {
    // The shared libraries are compiled from source into the app, not from their CommonJS builds.
    alias: {
      '@friable/contracts': lib('contracts'),
      '@friable/field': lib('field'),
      '@friable/stats': lib('stats'),
    },
  },
  server: {
    host: '127.0.0.1',
    port: 5173,
    proxy: { '/api': 'http://127.0.0.1:3000' },
  },
  build: {
    outDir: 'dist',
    emptyOutDir: true,
    sourcemap: true,
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
