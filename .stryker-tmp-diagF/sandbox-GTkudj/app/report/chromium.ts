/**
 * Headless Chromium, the one way Loftpoint prints: the report's HTML to PDF
 * and the diagram to PNG. Finds the browser ($CHROMIUM_PATH, then the usual
 * places), runs it on a page in a fresh temporary folder with a fresh
 * profile, and hands back the bytes it wrote. Nothing is fetched: the pages
 * are self-contained and the browser's own network features are off.
 */
// @ts-nocheck

import { spawn } from 'node:child_process';
import { accessSync, constants, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';

/** No browser to print with; the message says what to install or set. */
export class ChromiumUnavailable extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ChromiumUnavailable';
  }
}

/** The browser ran but did not produce the file (crash, time-out). */
export class ChromiumFailed extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ChromiumFailed';
  }
}

const PLACES = [
  '/usr/bin/chromium',
  '/usr/bin/chromium-browser',
  '/usr/bin/google-chrome',
  '/usr/bin/google-chrome-stable',
  '/snap/bin/chromium',
  '/Applications/Chromium.app/Contents/MacOS/Chromium',
  '/Applications/Google Chrome.app/Contents/MacOS/Google Chrome',
];

export const INSTALL_HINT =
  'PDF and PNG output need Chromium: install it (Debian or Ubuntu: apt-get install chromium) or set CHROMIUM_PATH to a Chromium or Chrome executable; .html, .svg and .csv need nothing';

function executable(file: string): boolean {
  try {
    accessSync(file, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

/** The browser to print with, or ChromiumUnavailable naming what to do. */
export function findChromium(env: Record<string, string | undefined> = process.env, places: readonly string[] = PLACES): string {
  const given = env.CHROMIUM_PATH?.trim();
  if (given) {
    if (executable(given)) return given;
    throw new ChromiumUnavailable(`CHROMIUM_PATH is ${given}, which is not an executable file. ${INSTALL_HINT}`);
  }
  const found = places.find(executable);
  if (!found) throw new ChromiumUnavailable(`no Chromium found. ${INSTALL_HINT}`);
  return found;
}

const COMMON_FLAGS = [
  '--headless',
  // The pages are our own static, script-free documents; the sandbox cannot start as root in containers.
  '--no-sandbox',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-extensions',
  '--no-first-run',
  '--no-default-browser-check',
  '--hide-scrollbars',
  '--mute-audio',
];

interface RunOptions {
  binary?: string;
  timeoutMs?: number;
}

/** Run the browser on `html` with the output flags; the bytes of `output` when it appears. */
async function render(html: string, output: string, flags: (outFile: string) => string[], options: RunOptions): Promise<Buffer> {
  const binary = options.binary ?? findChromium();
  const folder = mkdtempSync(join(tmpdir(), 'loftpoint-print-'));
  try {
    const page = join(folder, 'page.html');
    const outFile = join(folder, output);
    writeFileSync(page, html, 'utf8');
    const args = [...COMMON_FLAGS, `--user-data-dir=${join(folder, 'profile')}`, ...flags(outFile), pathToFileURL(page).href];
    const { code, stderr } = await runProcess(binary, args, options.timeoutMs ?? 90_000);
    if (!existsSync(outFile)) {
      const last = stderr.split('\n').map((line) => line.trim()).filter((line) => line !== '' && !line.startsWith('['))
        .pop();
      throw new ChromiumFailed(`Chromium (${binary}) wrote no ${output.split('.').pop()?.toUpperCase()} (exit ${code})${last ? `: ${last}` : ''}`);
    }
    return readFileSync(outFile);
  } finally {
    rmSync(folder, { recursive: true, force: true, maxRetries: 3, retryDelay: 100 });
  }
}

function runProcess(binary: string, args: string[], timeoutMs: number): Promise<{ code: number | null; stderr: string }> {
  return new Promise((resolve, reject) => {
    // Its own process group, so a browser that hangs is ended with every helper process it started.
    const child = spawn(binary, args, { stdio: ['ignore', 'ignore', 'pipe'], detached: true });
    let stderr = '';
    child.stderr?.setEncoding('utf8');
    child.stderr?.on('data', (chunk: string) => {
      stderr = (stderr + chunk).slice(-8000);
    });
    const timer = setTimeout(() => {
      try {
        if (child.pid !== undefined) process.kill(-child.pid, 'SIGKILL');
      } catch {
        child.kill('SIGKILL');
      }
      reject(new ChromiumFailed(`Chromium (${binary}) did not finish within ${Math.round(timeoutMs / 1000)} s`));
    }, timeoutMs);
    child.on('error', (error) => {
      clearTimeout(timer);
      reject(new ChromiumUnavailable(`Chromium (${binary}) could not be started: ${error.message}. ${INSTALL_HINT}`));
    });
    child.on('close', (code) => {
      clearTimeout(timer);
      resolve({ code, stderr });
    });
  });
}

/** The page printed to PDF; the paper size and margins come from the page's own @page rule. */
export function printPdf(html: string, options: RunOptions = {}): Promise<Buffer> {
  return render(html, 'out.pdf', (outFile) => ['--no-pdf-header-footer', '--run-all-compositor-stages-before-draw', `--print-to-pdf=${outFile}`], options);
}

/** A standalone SVG document as a PNG, `scale` device pixels per SVG pixel. */
export function svgToPng(svg: string, size: { width: number; height: number; scale?: number }, options: RunOptions = {}): Promise<Buffer> {
  const body = svg.replace(/^<\?xml[^>]*\?>\s*/, '');
  const html = `<!DOCTYPE html><html><head><meta charset="utf-8"><style>html,body{margin:0;padding:0;background:#ffffff;overflow:hidden}svg{display:block}</style></head><body>${body}</body></html>`;
  return render(
    html,
    'out.png',
    (outFile) => [`--window-size=${Math.ceil(size.width)},${Math.ceil(size.height)}`, `--force-device-scale-factor=${size.scale ?? 2}`, '--default-background-color=ffffffff', `--screenshot=${outFile}`],
    options,
  );
}
