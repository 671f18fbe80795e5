import { defineConfig } from 'vitest/config';

// Browser end-to-end tests: the built app served by the real backend on a throwaway database,
// driven in Debian's Chromium through playwright-core (never a downloaded browser).
export default defineConfig({
  test: {
    include: ['e2e/**/*.e2e.test.ts'],
    environment: 'node',
    globalSetup: ['./e2e/global-setup.ts'],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: false,
  },
});
