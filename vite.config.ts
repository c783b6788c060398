import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@data': fileURLToPath(new URL('./data', import.meta.url)),
};

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // A service worker (Workbox, generated at build) keeps the app shell — the built scripts, styles, fonts and
    // index.html — so a page opened once starts with no signal (D-026). It never answers /api: data comes from
    // the persisted query cache (src/lib/offline). Not in the dev server (hot reload needs the network).
    VitePWA({
      injectRegister: 'script-defer',
      registerType: 'autoUpdate',
      manifest: false,
      workbox: {
        globPatterns: ['**/*.{js,css,html,woff2,svg}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api(\/|$)/],
        cleanupOutdatedCaches: true,
        // The page that installed it is kept too: a phone that loses its signal right after the first visit
        // still reloads.
        clientsClaim: true,
        skipWaiting: true,
      },
    }),
  ],
  resolve: { alias },
  // convert-units reads `global`; the browser has only globalThis.
  define: { global: 'globalThis' },
  build: { outDir: 'dist/client', emptyOutDir: true, manifest: true },
  test: {
    // Both cores: vitest's default is one worker fewer than the cores, which is one on this 2-core machine (the
    // browser tests still run one file at a time, `fileParallelism: false` below).
    maxWorkers: 2,
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          include: [
            'shared/**/*.test.ts',
            'server/**/*.test.ts',
            'tests/verification/**/*.test.ts',
            'tests/architecture/**/*.test.ts',
          ],
          environment: 'node',
          setupFiles: ['tests/setup/fast-check.ts'],
          // Property tests and the PDF renders take seconds on a loaded 2-core machine; a hang still fails.
          testTimeout: 30_000,
        },
      },
      {
        plugins: [react()],
        resolve: { alias },
        define: { global: 'globalThis' },
        test: {
          name: 'client',
          include: ['src/**/*.test.tsx', 'src/**/*.test.ts'],
          environment: 'jsdom',
          // jsdom renders of whole sheets take seconds on a loaded 2-core machine; a hang still fails.
          testTimeout: 30_000,
          setupFiles: ['tests/setup/fast-check.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/postgres.ts'],
          setupFiles: ['tests/setup/fast-check.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/setup/build-client.ts'],
          testTimeout: 90_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
