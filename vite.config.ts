import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';
import { defineConfig } from 'vitest/config';

const dir = (p: string) => fileURLToPath(new URL(p, import.meta.url));

export const alias = {
  '@shared': dir('./shared'),
  '@grading': dir('./grading/index.ts'),
  '@planning': dir('./planning/index.ts'),
  '@exports': dir('./exports'),
  '@server': dir('./server'),
  '@tests': dir('./tests'),
  '@': dir('./src'),
};

export default defineConfig({
  plugins: [
    react(),
    tailwindcss(),
    // An installable app whose shell (HTML, scripts, styles, Latin fonts) is kept on the device, so the
    // floor screen opens with no network. The API is never cached: logs wait in the floor outbox instead.
    VitePWA({
      registerType: 'autoUpdate',
      injectRegister: 'script-defer',
      manifest: {
        name: 'Seamrun',
        short_name: 'Seamrun',
        description: 'Log bundles from the sewing floor, with or without network.',
        start_url: '/',
        scope: '/',
        display: 'standalone',
        theme_color: '#0F4C5C',
        background_color: '#F4EFE6',
        icons: [{ src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
      },
      workbox: {
        globPatterns: ['**/*.{js,css,html,svg,webmanifest}', 'assets/roboto-latin-*.woff2'],
        // The photo tracer's worker carries opencv.js (about 10 MB): fetched when a photo is traced, not kept.
        globIgnores: ['**/photo-trace.worker-*.js'],
        navigateFallback: 'index.html',
        navigateFallbackDenylist: [/^\/api\//],
        cleanupOutdatedCaches: true,
      },
    }),
  ],
  resolve: { alias },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    manifest: true,
    // Fonts stay files: the content-security policy allows fonts from 'self' only, not data: URIs.
    assetsInlineLimit: (file) => (/\.(woff2?|ttf|otf)$/.test(file) ? false : undefined),
  },
  server: {
    port: 5173,
    proxy: { '/api': { target: `http://localhost:${process.env.PORT ?? 3000}`, changeOrigin: false } },
  },
  test: {
    env: { TZ: 'UTC', NODE_ENV: 'test' },
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          environment: 'node',
          include: ['{shared,grading,planning,exports,server,src}/**/*.test.{ts,tsx}', 'tests/architecture/**/*.test.ts'],
          setupFiles: ['tests/fixtures/setup-unit.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'integration',
          environment: 'node',
          include: ['tests/integration/**/*.test.ts'],
          setupFiles: ['tests/fixtures/setup-integration.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/e2e/global-setup.ts'],
          testTimeout: 120_000,
          hookTimeout: 180_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
