import { defineConfig, devices } from '@playwright/test';

// E2E_DEV=1 runs against the vite dev server instead of the built app. E2E_PORT picks another port,
// so that two checkouts can run their end-to-end suites side by side.
const DEV = !!process.env.E2E_DEV;
const PORT = Number(process.env.E2E_PORT ?? (DEV ? 5173 : 4173));

export default defineConfig({
  testDir: './e2e',
  workers: 1,
  retries: 0,
  reporter: [['list']],
  timeout: 30_000,
  use: {
    baseURL: `http://127.0.0.1:${PORT}`,
    viewport: { width: 1400, height: 860 },
    launchOptions: {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
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
  projects: [
    { name: 'chromium', use: { ...devices['Desktop Chrome'], viewport: { width: 1400, height: 860 } } },
  ],
  webServer: {
    command: DEV
      ? `npx vite --port ${PORT} --strictPort --host 127.0.0.1`
      : `npx vite preview --port ${PORT} --strictPort --host 127.0.0.1`,
    url: `http://127.0.0.1:${PORT}`,
    reuseExistingServer: false,
    timeout: 30_000,
  },
});
