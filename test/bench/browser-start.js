#!/usr/bin/env node
// Browser mode from launch to the first diagram: `node app/cli/browser-mode.cjs`
// (what `npm start` runs without Electron) on a fresh project, its address
// opened in Chromium, until the page shows a requirement's curve. Beside it,
// interleaved run by run, a floor: a bare Node HTTP server started the same
// way, serving a page that draws one SVG path. Chromium is started once
// beforehand and is not in either time. Run: node test/bench/browser-start.js
//
// Target: under 1 s from launch to the first diagram. A new project is written
// by the server at once, with the demo checks the build recorded beside its
// single file (app/service/demo-checks.ts; without them, on a worker thread
// while the page loads, app/server/new-project-worker.ts); the window draws the
// diagram first and fills its side panels in the next frame, which the
// breakdown shows as "window ready". Both pages are watched in every animation
// frame, so a time is the frame the curve is first drawn in.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, watch } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { basename, dirname, join } from 'node:path';
import { chromium } from '@playwright/test';
import { pageBenchChromium, printedAddress } from './page-bench.js';
import { msText, spread } from './spread.js';

const root = new URL('../..', import.meta.url).pathname;
const RUNS = Number(process.env.RUNS ?? 7);
const browserPath = pageBenchChromium(root, 'browser-mode start');

const FLOOR_SERVER = `
const http = require('node:http');
const page = '<!doctype html><title>floor</title><svg width="400" height="300"><path data-testid="curve-floor" d="M10 10 L390 290" stroke="black"/></svg>';
const server = http.createServer((req, res) => { res.writeHead(200, { 'content-type': 'text/html' }); res.end(page); });
server.listen(0, '127.0.0.1', () => console.log('http://127.0.0.1:' + server.address().port + '/'));
process.on('SIGTERM', () => server.close(() => process.exit(0)));
`;

// Put in the page before its own script: when the window is first mounted, when the first curve appears, and
// when the window reads as ready (the side panels filled, which the window does in the frame after the diagram).
const PAGE_MARKS = `
window.__startMarks = { mounted: null, curve: null, drawn: null, ready: null };
{
  const marks = window.__startMarks;
  // The frame that draws the curve: the next animation frame, then a task, which runs once that frame is painted.
  const drawnAfterPaint = () => requestAnimationFrame(() => setTimeout(() => {
    const box = document.querySelector('[data-testid^="curve-"]')?.getBoundingClientRect();
    if (box && (box.width > 0 || box.height > 0)) marks.drawn = performance.now();
    else drawnAfterPaint();
  }, 0));
  new MutationObserver((changes, observer) => {
    if (marks.mounted === null && document.getElementById('app')?.firstElementChild) marks.mounted = performance.now();
    if (marks.curve === null && document.querySelector('[data-testid^="curve-"]')) {
      marks.curve = performance.now();
      drawnAfterPaint();
    }
    if (marks.ready === null && document.querySelector('[data-testid="window"][data-ready="true"]')) marks.ready = performance.now();
    if (marks.curve !== null && (marks.ready !== null || !document.getElementById('app'))) observer.disconnect();
  }).observe(document, { childList: true, subtree: true, attributes: true, attributeFilter: ['data-ready'] });
}
`;

/** Where the time went in one launch, in ms from launch: read from the page's own clock and resource timings. */
async function pageBreakdown(page, launchedAt, addressAt, projectAt) {
  const seen = await page.evaluate(() => ({
    origin: performance.timeOrigin,
    navigation: performance.getEntriesByType('navigation')[0]?.responseEnd ?? null,
    // The window's own script (the small module that sends the first calls ahead is not it).
    script: performance.getEntriesByType('resource').filter((e) => /\/assets\/index-[^/]*\.js$/.test(e.name)).map((e) => e.responseEnd)[0] ?? null,
    api: performance.getEntriesByType('resource').filter((e) => e.name.includes('/api/')).map((e) => ({ method: e.name.split('/api/')[1], start: e.startTime, end: e.responseEnd })),
    ...window.__startMarks,
  }));
  const at = (t) => (t === null ? null : seen.origin + t - launchedAt);
  const apiBefore = seen.api.filter((call) => seen.curve === null || call.end <= seen.curve);
  return {
    address: addressAt - launchedAt,
    project: projectAt === null ? null : projectAt - launchedAt,
    html: at(seen.navigation),
    script: at(seen.script),
    mounted: at(seen.mounted),
    firstApi: apiBefore.length ? at(apiBefore[0].start) : null,
    lastApi: apiBefore.length ? at(apiBefore[apiBefore.length - 1].end) : null,
    curve: at(seen.curve),
    drawn: at(seen.drawn),
    ready: at(seen.ready),
    calls: apiBefore.map((call) => `${call.method} ${Math.round(call.end - call.start)}`),
  };
}

/**
 * Starts a server, waits for its address line, opens it, waits for a curve; answers ms from launch to the frame that
 * draws it (and pushes the time the test driver heard of it onto `driverSaw`; with `breakdown`, where the time went,
 * with when the new project file `project` appeared whole: it is renamed into place).
 */
async function launchToDiagram(browser, args, env, { driverSaw, breakdown, project } = {}) {
  const launchedAt = performance.timeOrigin + performance.now();
  const start = performance.now();
  let projectAt = null;
  const watcher = project
    ? watch(dirname(project), (event, name) => {
        if (projectAt === null && name === basename(project) && existsSync(project)) projectAt = performance.timeOrigin + performance.now();
      })
    : null;
  const child = spawn(process.execPath, args, { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  try {
    const url = await printedAddress(child);
    const addressAt = performance.timeOrigin + performance.now();
    const page = await browser.newPage();
    await page.addInitScript(PAGE_MARKS);
    await page.goto(url);
    // Timed by the page's own clock: when the frame that first draws a curve is painted. The test driver hears of
    // it later, by as much as 0.2 s on a busy machine (its messages wait behind the page's and the server's work),
    // which is not part of the start; that time is kept beside it.
    await page.waitForFunction(() => window.__startMarks.drawn !== null, null, { polling: 'raf', timeout: 30_000 });
    const seen = performance.now() - start;
    const drawn = await page.evaluate(() => performance.timeOrigin + window.__startMarks.drawn);
    const ms = drawn - launchedAt;
    driverSaw?.push(seen);
    if (breakdown) {
      // Outside the timing: the whole window, side panels included.
      await page.locator('[data-testid="window"][data-ready="true"]').waitFor({ state: 'attached', timeout: 30_000 });
      breakdown.push(await pageBreakdown(page, launchedAt, addressAt, projectAt));
    }
    await page.close();
    return ms;
  } finally {
    watcher?.close();
    child.kill('SIGTERM');
    await new Promise((resolve) => (child.exitCode !== null ? resolve() : child.once('exit', resolve)));
  }
}


const browser = await chromium.launch({ executablePath: browserPath });
const folder = mkdtempSync(join(tmpdir(), 'loftpoint-start-'));
try {
  const mode = [];
  const floor = [];
  const modeSeen = [];
  const floorSeen = [];
  const breakdown = [];
  const serve = (r) => {
    const project = join(folder, `start-${r}.loftpoint`);
    return launchToDiagram(browser, [join(root, 'app/cli/browser-mode.cjs'), '--port', '0', '--project', project], { LOFTPOINT_DATA_DIR: join(folder, 'data') }, r === 'warm' ? {} : { driverSaw: modeSeen, breakdown, project });
  };
  const bare = () => launchToDiagram(browser, ['-e', FLOOR_SERVER], {}, { driverSaw: floorSeen });
  await serve('warm'); // a stale build is rebuilt here, outside the timing
  for (let r = 0; r < RUNS; r++) {
    if (r % 2 === 0) {
      mode.push(await serve(r));
      floor.push(await bare());
    } else {
      floor.push(await bare());
      mode.push(await serve(r));
    }
  }
  const m = spread(mode);
  const f = spread(floor);
  // How busy the machine is, in the run's own terms: the CPU time of a bare Node start (80-150 ms on this machine when it is quiet).
  const nodeStart = spawnSync(process.execPath, ['-e', 'const u = process.cpuUsage(); console.log((u.user + u.system) / 1000)'], { encoding: 'utf8' });
  console.log(`Browser mode, launch to first diagram, median (10th-90th percentile) of ${RUNS} interleaved runs; load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}; a bare Node start ${Math.round(Number(nodeStart.stdout))} ms CPU`);
  console.log(`  loftpoint browser mode (new project)   ${msText(m)}`);
  console.log(`  floor: bare server and one-path page   ${msText(f)}   ratio ${(m.median / f.median).toFixed(1)}x`);
  console.log(`  (the frame that draws the curve, by the page's clock; the test driver heard of it at ${msText(spread(modeSeen))} and ${msText(spread(floorSeen))})`);
  const median = (key) => {
    const values = breakdown.map((b) => b[key]).filter((v) => v !== null);
    return values.length ? `${Math.round(spread(values).median)}`.padStart(5) : '    -';
  };
  console.log('  where the time went (median ms from launch, each step on its own):');
  console.log(`    address printed ${median('address')}   page received ${median('html')}   page script received ${median('script')}   window mounted ${median('mounted')}`);
  console.log(`    new project file written ${median('project')} (by the server, with the demo checks the build recorded)`);
  console.log(`    first API call sent ${median('firstApi')}   last API answer before the curve ${median('lastApi')}   first curve in the page ${median('curve')}   drawn ${median('drawn')}`);
  console.log(`    window ready (side panels filled) ${median('ready')}`);
  console.log(`    API calls before the curve (ms each, last run): ${breakdown.at(-1)?.calls.join(', ') || 'none'}`);
  console.log(`Target under 1 s: ${m.median < 1000 ? 'met' : 'NOT met'}`);
} finally {
  await browser.close();
  rmSync(folder, { recursive: true, force: true });
}
