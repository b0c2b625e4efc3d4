import { defineConfig } from '@playwright/test';

/** Ports 8180–8189 belong to the browser tests, so they never meet a server someone else runs. */
const PORT = Number(process.env.E2E_PORT ?? 8180);
// localhost (not 127.0.0.1) because the server builds invitation links from http://localhost:$PORT,
// and the session cookie must belong to the same host the tests browse.
const BASE_URL = `http://localhost:${PORT}`;

const chromiumLaunch = {
  executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
  args: [
    '--no-sandbox',
    '--disable-gpu',
    '--disable-quic',
    '--no-first-run',
    '--disable-background-networking',
    '--disable-component-update',
    '--disable-sync',
  ],
};

export default defineConfig({
  testDir: 'tests/e2e',
  testMatch: '**/*.spec.ts',
  outputDir: 'test-results/artifacts',
  fullyParallel: false,
  // One server with one in-memory database: keep to a single worker so tests never race on its state.
  workers: 1,
  retries: 0,
  timeout: 60_000,
  expect: { timeout: 10_000 },
  forbidOnly: !!process.env.CI,
  reporter: [['list']],
  use: {
    baseURL: BASE_URL,
    launchOptions: chromiumLaunch,
    screenshot: 'only-on-failure',
    trace: 'retain-on-failure',
  },
  projects: [
    // The canvas specs are written for one window size each (canvas-phone, canvas-wide), so they run in their own project only.
    { name: 'phone', testIgnore: '**/canvas-*.spec.ts', use: { browserName: 'chromium', viewport: { width: 390, height: 844 }, hasTouch: true } },
    { name: 'wide', testIgnore: '**/canvas-*.spec.ts', use: { browserName: 'chromium', viewport: { width: 1440, height: 900 } } },
    { name: 'canvas-phone', testMatch: '**/canvas-phone*.spec.ts', use: { browserName: 'chromium', viewport: { width: 390, height: 844 }, hasTouch: true } },
    { name: 'canvas-wide', testMatch: '**/canvas-wide.spec.ts', use: { browserName: 'chromium', viewport: { width: 1440, height: 900 } } },
  ],
  webServer: {
    command: `PORT=${PORT} DATABASE_PATH=:memory: SEED=demo MAIL=fake npm run server`,
    url: `${BASE_URL}/api/auth/me`,
    // /api/auth/me answers 401 when signed out, which still proves the server is up.
    reuseExistingServer: false,
    timeout: 120_000,
    stdout: 'pipe',
    stderr: 'pipe',
  },
});
