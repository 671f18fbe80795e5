// Jest runs in ESM mode (node --experimental-vm-modules): NestJS 12 is ESM-only and cannot be
// loaded by jest's CommonJS runtime on Node 20 (see ../shared/STACK.md, "Gotchas").
const shared = {
  moduleFileExtensions: ['ts', 'js', 'json'],
  extensionsToTreatAsEsm: ['.ts'],
  testEnvironment: 'node',
  transform: {
    '^.+\\.ts$': ['ts-jest', { useESM: true, tsconfig: '<rootDir>/tsconfig.spec.json' }],
  },
  // Relative imports may carry a `.js` suffix (ESM style); the sources are `.ts`.
  moduleNameMapper: { '^(\\.{1,2}/.*)\\.js$': '$1' },
};

module.exports = {
  rootDir: __dirname,
  // End-to-end tests boot the app, hash passwords and wait for queued grading.
  testTimeout: 60_000,
  projects: [
    { ...shared, displayName: 'unit', rootDir: __dirname, testMatch: ['<rootDir>/src/**/*.spec.ts'] },
    {
      ...shared,
      displayName: 'e2e',
      rootDir: __dirname,
      testMatch: ['<rootDir>/e2e/**/*.e2e-spec.ts'],
      globalSetup: '<rootDir>/e2e/global-setup.mjs',
      globalTeardown: '<rootDir>/e2e/global-teardown.mjs',
    },
  ],
};
