import { fileURLToPath, URL } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

// In `npm run dev` the API runs beside Vite; requests to /api go through this proxy.
const apiUrl = process.env.MIXMARK_API_URL ?? 'http://127.0.0.1:4310';

export default defineConfig({
  plugins: [react()],
  resolve: { alias: { '@': fileURLToPath(new URL('./src', import.meta.url)) } },
  server: { proxy: { '/api': { target: apiUrl, changeOrigin: false } } },
  build: {
    outDir: 'dist',
    sourcemap: true,
    manifest: true,
    chunkSizeWarningLimit: 800,
    rolldownOptions: {
      // @mixmark/common is pure (no I/O, no globals; see DEVELOPERS.md), so a page that imports
      // one schema need not carry every other schema's module-level construction.
      treeshake: { moduleSideEffects: (id: string) => !/[\\/]common[\\/]dist[\\/]/.test(id) },
    },
  },
  test: {
    environment: 'jsdom',
    include: ['src/**/*.test.{ts,tsx}'],
    setupFiles: ['./src/testing/setup-tests.ts'],
    css: false,
    testTimeout: 20_000,
  },
});
