import { defineConfig } from '@playwright/test';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// End-to-end specs run against the production build served by the real server on a
// throw-away SQLite file, in Debian's Chromium (never a downloaded browser).
const port = Number(process.env.E2E_PORT ?? 4317);
const dbFile = join(tmpdir(), `slotwise-e2e-${process.pid}-${Date.now()}.sqlite`);

export default defineConfig({
  testDir: '.',
  testMatch: /.*\.spec\.ts$/,
  outputDir: '../test-results',
  timeout: 90_000,
  expect: { timeout: 15_000 },
  fullyParallel: false,
  workers: 1,
  retries: 0,
  reporter: [['list'], ['json']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1440, height: 900 },
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: [
        '--no-sandbox',
        '--enable-unsafe-swiftshader',
        '--use-angle=swiftshader',
        '--ignore-gpu-blocklist',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
        '--disable-quic',
        '--no-first-run',
      ],
    },
    trace: 'off',
    screenshot: 'only-on-failure',
  },
  webServer: {
    command: 'npx tsx server/index.ts',
    cwd: '..',
    url: `http://127.0.0.1:${port}/api/health`,
    reuseExistingServer: false,
    timeout: 120_000,
    env: {
      NODE_ENV: 'production',
      // Production seeds nothing unless asked; the specs sign in as the demo accounts.
      SEED_DEMO: '1',
      PORT: String(port),
      DATABASE_PATH: dbFile,
      SESSION_SECRET: 'e2e-session-secret-not-for-production-0123456789',
      // The specs read sent mail from the local fake SMTP server through the owner's outbox.
      MAIL_CATCHER: 'true',
      SLOTWISE_E2E: '1',
      CLIENT_DIST: process.env.CLIENT_DIST ?? 'dist',
    },
  },
});
