/**
 * Browser tests: the designer window in browser mode, driven in Debian's
 * Chromium. The web server builds the page, then starts `loftpoint serve` on
 * a free port with a project file in a temporary folder.
 */
// @ts-nocheck

import { defineConfig } from '@playwright/test';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

/** $CHROMIUM_PATH, Debian's /usr/bin/chromium, else Playwright's own browser. */
function chromiumPath(): string | undefined {
  return [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].find((path): path is string => !!path && existsSync(path));
}

// Chosen once in the runner; workers inherit the environment and see the same values.
process.env.LOFTPOINT_TEST_PORT ??= String(await freePort());
process.env.LOFTPOINT_TEST_ADDRESS_FILE ??= join(tmpdir(), `loftpoint-address-${process.env.LOFTPOINT_TEST_PORT}.txt`);
const port = process.env.LOFTPOINT_TEST_PORT;
// Each run builds the page into its own folder, so two runs at once never share files.
process.env.LOFTPOINT_TEST_RENDERER_DIR ??= join(root, 'out', `renderer-test-${port}`);
const rendererDir = process.env.LOFTPOINT_TEST_RENDERER_DIR;

export default defineConfig({
  testDir: '.',
  testMatch: '*.spec.ts',
  outputDir: join(root, 'test-results'),
  // One server and one project file: the specs run one after another.
  workers: 1,
  fullyParallel: false,
  timeout: 60_000,
  expect: { timeout: 7_000 },
  reporter: [['list']],
  use: {
    baseURL: `http://127.0.0.1:${port}`,
    viewport: { width: 1440, height: 900 },
    launchOptions: {
      executablePath: chromiumPath(),
      args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
    },
  },
  webServer: {
    command: `node node_modules/vite/bin/vite.js build --config app/renderer/vite.config.ts --outDir "${rendererDir}" --logLevel error && node node_modules/tsx/dist/cli.mjs test/browser/serve.ts`,
    cwd: root,
    url: `http://127.0.0.1:${port}/`,
    timeout: 180_000,
    reuseExistingServer: false,
    stdout: 'pipe',
    stderr: 'pipe',
    env: {
      LOFTPOINT_TEST_PORT: port,
      LOFTPOINT_TEST_ADDRESS_FILE: process.env.LOFTPOINT_TEST_ADDRESS_FILE,
      LOFTPOINT_TEST_RENDERER_DIR: rendererDir,
      VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true',
      LOFTPOINT_AUTHOR: 'browser-test',
    },
  },
});
