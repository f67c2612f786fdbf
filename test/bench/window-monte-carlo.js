#!/usr/bin/env node
// The window's chance study on one and two threads, as a user runs it again
// and again while working: browser mode (the built page, out/renderer) in
// Chromium, a demo opened, the typical ranges filled where it has none of its
// own, 10,000 samples (the window's default), then "Run" pressed RUNS times
// with the window seeing one core and two cores in turn (Chrome DevTools
// Protocol's hardware-concurrency override of the page; the page tells the
// study how many threads it may use). Both thread counts have run twice
// before the timed runs, so the study's worker and its helper thread are
// warm, as they are from the second run on in the window. The first run after
// the window opens, when both start cold, is measured apart and printed beside.
//
// The time is the study's own (data-elapsed-ms: from the study's worker
// receiving the run to its map), the same clock for both. Identical results
// for the seed are checked on what the window shows: the chance at the design
// point (full precision), each requirement's chance and the optimum's spread.
// The map itself is checked bit for bit in test/renderer/studies/
// probability-runner.test.ts and by monte-carlo-cores.js.
//
// Run: node test/bench/window-monte-carlo.js (needs `npm run build:renderer` after a change to the page)
import { spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from '@playwright/test';
import { pageBenchChromium, printedAddress } from './page-bench.js';
import { msText, spread } from './spread.js';

const root = new URL('../..', import.meta.url).pathname;
const RUNS = Number(process.env.RUNS ?? 9);
const FIRST_RUNS = Number(process.env.FIRST_RUNS ?? 5);
const browserPath = pageBenchChromium(root, "the window's chance study");
const DEMOS = [
  ['utility-twin', /utility twin/i],
  ['business-jet', /business jet/i],
];


/** Starts browser mode on a fresh project; its address and how to stop it. */
async function startServer(folder) {
  const child = spawn(process.execPath, [join(root, 'app/cli/browser-mode.cjs'), '--port', '0', '--project', join(folder, 'bench.loftpoint')], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
  const url = await printedAddress(child);
  return { url, stop: () => child.kill('SIGTERM') };
}

/** Presses Run and waits, in the page, until the study's result is shown; what the window then shows. */
async function runOnce(page) {
  return page.evaluate(
    () =>
      new Promise((resolve, reject) => {
        document.querySelector('[data-testid="run-study"]').click();
        const started = performance.now();
        // Svelte shows the running study in a microtask after the click; this first look comes after it.
        const look = () => {
          const failed = document.querySelector('[data-testid="study-message"][role="alert"]');
          if (failed) return reject(new Error(`the study failed: ${failed.textContent}`));
          if (!document.querySelector('[data-testid="cancel-study"]') && document.querySelector('[data-testid="study-meta"]')) {
            return resolve({
              elapsed: Number(document.querySelector('[data-testid="study-meta"]').dataset.elapsedMs),
              shown: performance.now() - started,
              seen: JSON.stringify({
                point: document.querySelector('[data-testid="point-probability"]')?.dataset.value,
                each: [...document.querySelectorAll('[data-testid="requirement-probability"]')].map((row) => row.textContent.replace(/\s+/g, ' ').trim()),
                spread: document.querySelector('[data-testid="optimum-spread"]')?.textContent.replace(/\s+/g, ' ').trim(),
                meta: document.querySelector('[data-testid="study-meta"]').textContent.replace(/ · [\d.]+ s\s*$/, '').replace(/\s+/g, ' ').trim(),
              }),
            });
          }
          setTimeout(look, 2);
        };
        setTimeout(look, 0);
      }),
  );
}

/** A new window on the demo's Ranges tab, ready to run its chance study, seeing `n` cores. */
async function openStudy(browser, url, name, n) {
  const page = await browser.newPage({ viewport: { width: 1440, height: 900 } });
  const cdp = await page.context().newCDPSession(page);
  const cores = (count) => cdp.send('Emulation.setHardwareConcurrencyOverride', { hardwareConcurrency: count });
  await cores(n);
  await page.goto(url);
  await page.locator('[data-testid="window"][data-ready="true"]').waitFor({ timeout: 30_000 });
  const select = page.locator('select', { has: page.locator('option', { hasText: name }) });
  const label = await select.locator('option', { hasText: name }).first().textContent();
  await select.selectOption({ label: label.trim() });
  await page.getByText('Ranges', { exact: true }).click();
  if (await page.getByTestId('fill-typical').isEnabled()) await page.getByTestId('fill-typical').click();
  await page.getByTestId('run-study').waitFor();
  return { page, cores };
}

async function measure(browser, url, slug, name) {
  // The first run after the window opens: the study's worker and its helper start and compile then.
  const first = { 1: [], 2: [] };
  const seen = new Set();
  for (let r = 0; r < FIRST_RUNS; r++) {
    for (const n of r % 2 === 0 ? [1, 2] : [2, 1]) {
      const { page } = await openStudy(browser, url, name, n);
      const result = await runOnce(page);
      first[n].push(result.elapsed);
      seen.add(result.seen);
      await page.close();
    }
  }
  const { page, cores } = await openStudy(browser, url, name, 2);
  for (const n of [2, 1, 2, 1]) {
    await cores(n);
    await runOnce(page);
  }
  const times = { 1: [], 2: [] };
  const shown = { 1: [], 2: [] };
  for (let r = 0; r < RUNS; r++) {
    for (const n of r % 2 === 0 ? [1, 2] : [2, 1]) {
      await cores(n);
      const result = await runOnce(page);
      times[n].push(result.elapsed);
      shown[n].push(result.shown);
      seen.add(result.seen);
    }
  }
  const samples = JSON.parse([...seen][0]).meta;
  await page.close();
  const one = spread(times[1]);
  const two = spread(times[2]);
  console.log(`Window chance study, ${slug} demo (${samples}); median (10th-90th percentile) of ${RUNS} interleaved runs, warm`);
  console.log(`  cores ${availableParallelism()}; load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}`);
  console.log(`  1 thread    study ${msText(one)}   press to result shown ${msText(spread(shown[1]))}`);
  console.log(`  2 threads   study ${msText(two)}   press to result shown ${msText(spread(shown[2]))}   speed-up ${(one.median / two.median).toFixed(2)}x`);
  const cold1 = spread(first[1]);
  const cold2 = spread(first[2]);
  console.log(`  first run after the window opens (worker and helper start and compile; ${FIRST_RUNS} each): 1 thread ${msText(cold1)}, 2 threads ${msText(cold2)}: ${(cold1.median / cold2.median).toFixed(2)}x`);
  console.log(`  results shown identical on 1 and 2 threads, every run (first runs included): ${seen.size === 1 ? 'yes' : `NO (${seen.size} different)`}`);
  return { slug, one: one.median, speedUp: one.median / two.median, identical: seen.size === 1 };
}

const folder = mkdtempSync(join(tmpdir(), 'loftpoint-window-mc-'));
const server = await startServer(folder);
const browser = await chromium.launch({ executablePath: browserPath });
try {
  const results = [];
  for (const [slug, name] of DEMOS) results.push(await measure(browser, server.url, slug, name));
  for (const r of results) {
    console.log(
      `Target at least 1.6x with two free cores, window, ${r.slug} (${Math.round(r.one)} ms on one thread): ${r.speedUp.toFixed(2)}x, ${r.speedUp >= 1.6 ? 'met' : 'not met'} at this load; identical results ${r.identical ? 'met' : 'NOT met'}`,
    );
  }
} finally {
  await browser.close();
  server.stop();
  rmSync(folder, { recursive: true, force: true });
}
