import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

// In `npm run dev` the API runs beside Vite; requests to /api go through this proxy.
const apiUrl = process.env.MIXMARK_API_URL ?? 'http://127.0.0.1:4310';

// React Router's package exports point at its development build in every mode (its issue
// #14102): a production build takes the production files it ships beside them, which leave out
// the development warnings.
const reactRouterDir = dirname(createRequire(import.meta.url).resolve('react-router/package.json'));
const reactRouterProduction = [
  { find: /^react-router$/, replacement: join(reactRouterDir, 'dist/production/index.mjs') },
  { find: /^react-router\/dom$/, replacement: join(reactRouterDir, 'dist/production/dom-export.mjs') },
];

export default defineConfig(({ command }) => ({
  plugins: [react()],
  resolve: {
    alias: [
      { find: '@', replacement: fileURLToPath(new URL('./src', import.meta.url)) },
      ...(command === 'build' ? reactRouterProduction : []),
    ],
  },
  server: { proxy: { '/api': { target: apiUrl, changeOrigin: false } } },
  build: {
    outDir: 'dist',
    sourcemap: true,
    manifest: true,
    chunkSizeWarningLimit: 800,
    rolldownOptions: {
      output: {
        codeSplitting: {
          // Everything the first page needs in one file (it all loads at once anyway): one
          // request, and gzip sees it whole (~3 KB less than the same code in six pieces).
          groups: [{ name: 'initial', tags: ['$initial'], priority: 2 }],
        },
      },
      // @mixmark/common is pure (no I/O, no globals; see DEVELOPERS.md), so a page that imports
      // one schema need not carry every other schema's module-level construction. yup's own
      // module-level code only fills in its classes' prototypes, and hoist-non-react-statics is
      // imported by emotion for a helper MUI never calls: a page that uses neither (the entry
      // needs only common's `isApiError`) need not load them.
      treeshake: {
        moduleSideEffects: (id: string) =>
          !/[\\/]common[\\/]dist[\\/]|[\\/]node_modules[\\/](yup|hoist-non-react-statics)[\\/]/.test(id),
      },
    },
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup-tests.ts'],
    css: false,
    testTimeout: 20_000,
  },
}));
