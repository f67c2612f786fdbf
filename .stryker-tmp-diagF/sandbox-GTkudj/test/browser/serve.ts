/**
 * Browser mode for the browser tests: `loftpoint serve` on a port the
 * Playwright config chose, with a project file in a fresh temporary folder
 * (the user's data folder is never touched). The printed address, token
 * included, is also written to $LOFTPOINT_TEST_ADDRESS_FILE for the specs.
 */
// @ts-nocheck

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runServe } from '../../app/cli/serve';
import { processIO } from '../../app/cli/io';

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-browser-'));
process.env.LOFTPOINT_DATA_DIR = join(folder, 'data');
const addressFile = process.env.LOFTPOINT_TEST_ADDRESS_FILE;
let first = true;

const io = {
  out(text: string) {
    if (first && addressFile) writeFileSync(addressFile, text.split('\n')[0]);
    first = false;
    processIO.out(text);
  },
  err: processIO.err,
};

const stop = new Promise<void>((resolve) => {
  process.once('SIGTERM', () => resolve());
  process.once('SIGINT', () => resolve());
});

const renderer = process.env.LOFTPOINT_TEST_RENDERER_DIR;
await runServe({ port: process.env.LOFTPOINT_TEST_PORT ?? '0', project: join(folder, 'Browser tests.loftpoint'), ...(renderer ? { rendererDir: renderer } : {}) }, io, stop);
if (renderer) rmSync(renderer, { recursive: true, force: true });
