import { defineConfig } from '@playwright/test';
import { e2eBaseUrl } from './test/e2e/support/e2e-hub';

// Journeys drive Debian's Chromium (never a downloaded browser) against a hub on a throwaway database.
export default defineConfig({
  testDir: 'test/e2e',
  testMatch: '**/*.spec.ts',
  outputDir: 'test/artifacts/playwright',
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  reporter: [['list']],
  globalSetup: './test/e2e/support/global-setup.ts',
  use: {
    baseURL: e2eBaseUrl(),
    viewport: { width: 1024, height: 768 },
    trace: 'off',
    screenshot: 'only-on-failure',
    launchOptions: {
      executablePath: process.env['CHROMIUM_PATH'] ?? '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    },
  },
});
