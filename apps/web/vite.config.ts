import react from '@vitejs/plugin-react';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const lib = (name: string) => fileURLToPath(new URL(`../../libs/${name}/src/index.ts`, import.meta.url));

export default defineConfig({
  plugins: [react()],
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
    // Typing through user-event is slow on a busy two-core CI machine; 5 s timed out there.
    testTimeout: 20_000,
  },
});
