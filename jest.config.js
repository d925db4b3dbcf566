// Two projects: the hub (node, SWC) and the app (jsdom, Angular preset, zoneless).
const { createCjsPreset } = require('jest-preset-angular/presets');

/** @type {import('jest').Config} */
module.exports = {
  projects: [
    {
      displayName: 'hub',
      testEnvironment: 'node',
      // Real MariaDB work (migrations up and down, bcrypt sign-ins) takes seconds on a busy 2-core machine.
      testTimeout: 30_000,
      roots: ['<rootDir>/test/server', '<rootDir>/test/domain'],
      testMatch: ['**/*.test.ts'],
      transform: {
        '^.+\\.ts$': ['@swc/jest', { jsc: { parser: { syntax: 'typescript' }, target: 'es2022' } }],
        // ESM-only packages from npm, turned into CommonJS for jest.
        '^.+/node_modules/(potpack)/.+\\.js$': ['@swc/jest', { jsc: { target: 'es2022' }, module: { type: 'commonjs' } }],
      },
      transformIgnorePatterns: ['/node_modules/(?!(potpack)/)'],
      globalSetup: '<rootDir>/test/server/support/global-setup.ts',
      setupFiles: ['<rootDir>/test/server/support/worker-database.ts'],
    },
    {
      displayName: 'app',
      ...createCjsPreset({ tsconfig: '<rootDir>/tsconfig.spec.json' }),
      roots: ['<rootDir>/src'],
      testMatch: ['**/*.spec.ts'],
      setupFilesAfterEnv: ['<rootDir>/src/test-setup.ts'],
    },
  ],
};
