import { fileURLToPath, URL } from 'node:url'
import { defineConfig } from 'vitest/config'
import vue from '@vitejs/plugin-vue'
import vuetify from 'vite-plugin-vuetify'

const alias = {
  '@': fileURLToPath(new URL('./src', import.meta.url)),
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
}

// One config for the client build and for Vitest. The three test projects split the suite by
// what it needs: `unit` nothing, `api` PostgreSQL and Redis, `browser` those plus a built client
// and Debian's Chromium. scripts/test-all.sh starts the services and runs them in order.
export default defineConfig({
  plugins: [vue(), vuetify({ autoImport: true })],
  resolve: { alias },
  server: {
    port: 5173,
    proxy: { '/api': `http://127.0.0.1:${process.env.PORT ?? 3000}` },
  },
  build: { outDir: 'dist', chunkSizeWarningLimit: 2000 },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/shared/**/*.test.ts', 'tests/client/**/*.test.ts', 'tests/worker/unit/**/*.test.ts', 'tests/cli/**/*.test.ts'],
          environment: 'node',
          testTimeout: 60_000,
          // Vuetify's components import their CSS; inlining lets Vite handle it in component tests.
          server: { deps: { inline: ['vuetify'] } },
        },
      },
      {
        extends: true,
        test: {
          name: 'api',
          include: ['tests/server/**/*.test.ts', 'tests/worker/**/*.integration.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'start',
          include: ['tests/start/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 600_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
})
