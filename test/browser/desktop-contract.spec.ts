/**
 * Desktop contract test. NOT ELECTRON: a stand-in for the `electron` module
 * (test/desktop/electron-stand-in.mjs) records what the BUILT main process
 * does and lets it run: the built preload is bridged to the main process's
 * IPC handlers, and the built page is shown in Debian's Chromium, served
 * through the main process's own loftpoint:// protocol handler. It checks the
 * contract between main, preload and page on machines with no Electron
 * binary; test/browser/electron-smoke.spec.ts runs the real thing where one
 * exists.
 */
import { expect, test, type Browser, type Page } from '@playwright/test';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import { register } from 'node:module';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));
const folder = mkdtempSync(join(tmpdir(), 'loftpoint-desktop-contract-'));
// Inside the repository (out/ is ignored), so the built main resolves node_modules and reads as ESM.
const built = join(root, 'out', `desktop-contract-${process.pid}`);
const documents = join(folder, 'documents');
const startFile = join(folder, 'Start study.loftpoint');
const standInUrl = pathToFileURL(join(root, 'test/desktop/electron-stand-in.mjs')).href;

type MenuItem = { label?: string; role?: string; type?: string; checked?: boolean; accelerator?: string; enabled?: boolean; click?: () => void; submenu?: MenuItem[] };
type StandInWindow = {
  options: { webPreferences?: Record<string, unknown> };
  webContents: { session: { cleared: number } };
  url?: string;
  title: string;
  destroyed: boolean;
  shown: boolean;
};
interface Recorder {
  calls: Array<{ name: string; args: unknown[] }>;
  appListeners: Map<string, Array<(...args: unknown[]) => void>>;
  ipcHandlers: Map<string, (event: unknown, payload: unknown) => Promise<unknown>>;
  ipcListeners: Map<string, Array<(event: unknown, payload: unknown) => void>>;
  windows: StandInWindow[];
  applicationMenu: { template: MenuItem[] } | null;
  privilegedSchemes: Array<{ scheme: string; privileges: Record<string, boolean> }>;
  protocolHandlers: Map<string, (request: Request) => Promise<Response>>;
  dialogAnswers: { open: string[]; save: string[] };
  dialogs: Array<{ kind: string; options: { filters?: Array<{ extensions: string[] }> } }>;
  messageBoxes: Array<{ title?: string; message?: string; detail?: string }>;
  recentDocuments: string[];
  driver: unknown;
}

let recorder: Recorder;
let page: Page;
let server: Server;
let served: string[] = [];
const pageErrors: string[] = [];
const printPages = new Map<StandInWindow, Page>();
const designerPages = new Map<StandInWindow, Page>();

/** Uint8Array results (the printed PDF) cross to the page as tagged base64, as IPC's structured clone would carry bytes. */
function encode(value: unknown): unknown {
  if (value instanceof Uint8Array) return { __standInBytes: Buffer.from(value).toString('base64') };
  if (Array.isArray(value)) return value.map(encode);
  if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([key, entry]) => [key, encode(entry)]));
  return value;
}

/** The built preload, run in the page with `require('electron')` answered by a bridge to the main process's IPC. */
function preloadBridge(preload: string): string {
  return `(() => {
  const decode = (value) => {
    if (value && typeof value === 'object' && typeof value.__standInBytes === 'string') return Uint8Array.from(atob(value.__standInBytes), (c) => c.charCodeAt(0));
    if (Array.isArray(value)) return value.map(decode);
    if (value && typeof value === 'object') return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, decode(v)]));
    return value;
  };
  const listeners = new Map();
  window.__standInDeliver = (channel, args) => { for (const listener of listeners.get(channel) ?? []) listener({}, ...args); };
  const ipcRenderer = {
    invoke: async (channel, payload) => decode(await window.__standInInvoke(channel, payload)),
    send: (channel, payload) => void window.__standInSend(channel, payload),
    on: (channel, listener) => void listeners.set(channel, [...(listeners.get(channel) ?? []), listener]),
    off: (channel, listener) => void listeners.set(channel, (listeners.get(channel) ?? []).filter((l) => l !== listener)),
  };
  const contextBridge = { exposeInMainWorld: (key, value) => Object.defineProperty(window, key, { value: Object.freeze(value) }) };
  const require = (name) => { if (name === 'electron') return { contextBridge, ipcRenderer }; throw new Error('a sandboxed preload may require only electron, not ' + name); };
  const module = { exports: {} };
  (function (require, module, exports) {
${preload}
  })(require, module, module.exports);
})();`;
}

function installDriver(browser: Browser, port: number): void {
  const preload = readFileSync(join(built, 'preload', 'index.cjs'), 'utf8');
  recorder.driver = {
    async show(window: StandInWindow, url: string) {
      const shown = await browser.newPage({ viewport: { width: 1440, height: 900 } });
      shown.on('pageerror', (error) => pageErrors.push(error.message));
      shown.on('console', (message) => {
        if (message.type() === 'error') pageErrors.push(message.text());
      });
      const event = () => ({ sender: window.webContents, senderFrame: { url: window.url } });
      await shown.exposeFunction('__standInInvoke', async (channel: string, payload: unknown) => {
        const handler = recorder.ipcHandlers.get(channel);
        if (!handler) throw new Error(`No handler for ${channel}`);
        return encode(await handler(event(), payload));
      });
      await shown.exposeFunction('__standInSend', (channel: string, payload: unknown) => {
        for (const listener of recorder.ipcListeners.get(channel) ?? []) listener(event(), payload);
      });
      await shown.addInitScript({ content: preloadBridge(preload) });
      designerPages.set(window, shown);
      page = shown;
      await shown.goto(`http://127.0.0.1:${port}${new URL(url).pathname}`);
    },
    async showFile(window: StandInWindow, file: string) {
      const context = await browser.newContext({ javaScriptEnabled: window.options.webPreferences?.javascript !== false });
      const printed = await context.newPage();
      printPages.set(window, printed);
      await printed.goto(pathToFileURL(file).href);
    },
    async printToPDF(window: StandInWindow, options: { printBackground?: boolean; preferCSSPageSize?: boolean }) {
      return printPages.get(window)!.pdf({ printBackground: options.printBackground, preferCSSPageSize: options.preferCSSPageSize });
    },
    async send(window: StandInWindow, channel: string, args: unknown[]) {
      const page = designerPages.get(window);
      // The test's own teardown closes the pages while main still holds its windows open: a message
      // main sends in that moment (a notice of the last action) has no page to reach.
      if (!page || page.isClosed()) return;
      try {
        await page.evaluate(([c, a]) => (window as unknown as { __standInDeliver: (c: string, a: unknown[]) => void }).__standInDeliver(c as string, a as unknown[]), [channel, args] as const);
      } catch (error) {
        if (!/has been closed/.test(String(error))) throw error;
      }
    },
    async close(window: StandInWindow) {
      await printPages.get(window)?.context().close();
    },
  };
}

function items(template: MenuItem[]): MenuItem[] {
  return template.flatMap((item) => [item, ...(item.submenu ? items(item.submenu) : [])]);
}

function menuItem(label: string): MenuItem {
  const found = items(recorder.applicationMenu!.template).find((item) => item.label === label);
  if (!found) throw new Error(`no menu item "${label}"`);
  return found;
}

const clicked = new Set<string>();
function click(label: string): void {
  clicked.add(label);
  menuItem(label).click!();
}

function cliVersions(file: string): Array<{ number: number; note: string; conceptName: string }> {
  const result = spawnSync(process.execPath, [join(root, 'app/cli/loftpoint.js'), 'project', 'versions', file, '--json'], { encoding: 'utf8' });
  expect(result.status, result.stderr).toBe(0);
  const parsed = JSON.parse(result.stdout);
  return Array.isArray(parsed) ? parsed : parsed.versions;
}

async function exported(label: string, name: string): Promise<Buffer> {
  const file = join(documents, name);
  recorder.dialogAnswers.save.push(file);
  click(label);
  await expect.poll(() => existsSync(file), { timeout: 30_000 }).toBe(true);
  return readFileSync(file);
}

const byTest = (id: string) => page.getByTestId(id);

test.describe.configure({ mode: 'serial' });

test.describe('desktop contract with a stand-in for Electron (NOT Electron): built main process and preload, built page in Chromium', () => {
  test.beforeAll(async ({ browser }) => {
    test.setTimeout(120_000);
    const build = spawnSync(join(root, 'node_modules/.bin/electron-vite'), ['build', '--config', 'electron.config.ts', '--outDir', built, '--logLevel', 'error'], {
      cwd: root,
      encoding: 'utf8',
      env: { ...process.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' },
    });
    expect(build.status, build.stderr).toBe(0);
    mkdirSync(documents, { recursive: true });
    process.env.LOFTPOINT_DATA_DIR = join(folder, 'data');
    process.env.LOFTPOINT_STAND_IN_DOCUMENTS = documents;
    process.env.LOFTPOINT_AUTHOR = 'desktop-contract';
    register(pathToFileURL(join(root, 'test/desktop/electron-stand-in-hooks.mjs')), { data: { standIn: standInUrl } });
    recorder = (await import(standInUrl)).recorder as Recorder;

    // The page protocol, answered by main's own handler, over HTTP so Chromium can load it.
    server = createServer(async (request, response) => {
      served.push(request.url ?? '');
      const handler = recorder.protocolHandlers.get('loftpoint');
      const answer = await handler!(new Request(`loftpoint://app${request.url}`));
      response.writeHead(answer.status, Object.fromEntries(answer.headers));
      response.end(Buffer.from(await answer.arrayBuffer()));
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    const port = (server.address() as { port: number }).port;
    installDriver(browser, port);

    // Boot the built main process as `electron out/main/index.js --project=FILE`.
    const argv = process.argv;
    process.argv = [process.execPath, join(built, 'main', 'index.js'), `--project=${startFile}`];
    await import(pathToFileURL(join(built, 'main', 'index.js')).href);
    process.argv = argv;
    await expect.poll(() => designerPages.size, { timeout: 30_000 }).toBe(1);
    await expect(byTest('window')).toHaveAttribute('data-ready', 'true', { timeout: 30_000 });
  });

  test.afterAll(async () => {
    server?.close();
    for (const shown of designerPages.values()) await shown.close();
    rmSync(built, { recursive: true, force: true });
  });

  test('boots: page scheme registered before ready, page through its own protocol, locked-down window, project from --project=FILE', async () => {
    const names = recorder.calls.map((call) => call.name);
    expect(recorder.privilegedSchemes).toEqual([expect.objectContaining({ scheme: 'loftpoint', privileges: expect.objectContaining({ standard: true, secure: true }) })]);
    expect(names.indexOf('app.whenReady')).toBeGreaterThan(-1);
    const designer = recorder.windows[0];
    expect(designer.url).toBe('loftpoint://app/index.html');
    expect(designer.options.webPreferences).toMatchObject({ contextIsolation: true, sandbox: true, nodeIntegration: false });
    expect(designer.shown).toBe(true);
    expect(served).toContain('/index.html');
    expect(served.some((path) => path.startsWith('/assets/'))).toBe(true);
    // The protocol refuses a way out of the page's folder.
    const escape = await recorder.protocolHandlers.get('loftpoint')!(new Request('loftpoint://app/..%2f..%2fpackage.json'));
    expect(escape.status).toBe(404);
    // --project=FILE created the named project (with the demo concepts), shown in the title.
    expect(existsSync(startFile)).toBe(true);
    expect(designer.title).toBe('Start study — Loftpoint');
    await expect(byTest('design-point-marker')).toBeVisible();
    await expect(byTest('curve-cruise')).toBeVisible();
    mkdirSync(join(root, 'test/browser/screenshots'), { recursive: true });
    await page.screenshot({ path: join(root, 'test/browser/screenshots/desktop-contract-boot.png') });
    expect(pageErrors).toEqual([]);
  });

  test('the built main process needs only Electron and the production dependencies a packaged app carries', async () => {
    const pkg = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8'));
    const files = [join(built, 'main', 'index.js'), ...readdirSync(join(built, 'main', 'chunks')).map((name) => join(built, 'main', 'chunks', name))];
    const bare = new Set<string>();
    for (const file of files) {
      for (const match of readFileSync(file, 'utf8').matchAll(/(?:^|\n)import[^;'"]*?from\s*"([^"./][^"]*)"|\bimport\("([^"./][^"]*)"\)/g)) {
        const name = (match[1] ?? match[2]).split('/').slice(0, (match[1] ?? match[2]).startsWith('@') ? 2 : 1).join('/');
        if (!name.startsWith('node:')) bare.add(name);
      }
    }
    expect(bare.has('electron')).toBe(true);
    for (const name of bare) if (name !== 'electron') expect(Object.keys(pkg.dependencies), `${name} is imported by the built main process`).toContain(name);
  });

  test('menus carry the usual accelerators, and the page leaves those keys to them', async () => {
    expect(menuItem('Undo').accelerator).toBe('CmdOrCtrl+Z');
    expect(menuItem('Save Version…').accelerator).toBe('CmdOrCtrl+S');
    expect(menuItem('New Project…').accelerator).toBe('CmdOrCtrl+N');
    // An edit: the design point dragged on the diagram (one undo step).
    const marker = byTest('design-point-marker');
    const start = (await marker.boundingBox())!;
    await page.mouse.move(start.x + start.width / 2, start.y + start.height / 2);
    await page.mouse.down();
    await page.mouse.move(start.x + start.width / 2 + 60, start.y + start.height / 2 - 40, { steps: 8 });
    await page.mouse.up();
    const moved = (await marker.boundingBox())!;
    expect(Math.abs(moved.x - start.x)).toBeGreaterThan(20);
    await expect(byTest('unsaved')).toBeVisible();
    // The page reports its unsaved state; the window title carries the mark.
    await expect.poll(() => recorder.windows[0].title).toBe('• Start study — Loftpoint');
    // Ctrl+Z in the page does nothing by itself: Electron's menu accelerator sends the one undo.
    await page.keyboard.press('Control+z');
    await page.waitForTimeout(300);
    expect((await marker.boundingBox())!.x).toBeCloseTo(moved.x, 0);
    click('Undo');
    await expect.poll(async () => Math.round((await marker.boundingBox())!.x)).toBe(Math.round(start.x));
    click('Redo');
    await expect.poll(async () => Math.round((await marker.boundingBox())!.x)).toBe(Math.round(moved.x));
  });

  test('saves a version with a note through IPC into the SQLite file, then compares two versions', async () => {
    const before = cliVersions(startFile);
    click('Save Version…');
    await expect(byTest('version-note')).toBeFocused();
    await byTest('version-note').fill('Cruise raised for the touring role (contract test)');
    await byTest('save-version').click();
    await expect(byTest('unsaved')).toHaveCount(0);
    await expect.poll(() => recorder.windows[0].title).toBe('Start study — Loftpoint');
    const after = cliVersions(startFile);
    expect(after.length).toBe(before.length + 1);
    const newest = after.reduce((a, b) => (a.number > b.number ? a : b));
    expect(newest.note).toBe('Cruise raised for the touring role (contract test)');

    const list = byTest('version-list').locator('li');
    await expect(list).toHaveCount(2);
    const numbers = await list.evaluateAll((rows) => rows.map((row) => Number(row.getAttribute('data-testid')!.replace('version-', ''))));
    for (const number of numbers) await byTest(`version-${number}`).getByTestId('version-select').check();
    await byTest('compare-selected').click();
    await expect(byTest('viewing-banner')).toContainText('Comparing');
    await byTest('back-to-draft').click();
    await expect(byTest('viewing-banner')).toHaveCount(0);
  });

  test('units: the View menu sets the page, and the page sets the View menu', async () => {
    click('US Customary Units');
    await expect(byTest('units-us')).toHaveAttribute('aria-pressed', 'true');
    await byTest('units-si').click();
    await expect.poll(() => menuItem('SI Units').checked).toBe(true);
    expect(menuItem('US Customary Units').checked).toBe(false);
    await byTest('units-us').click();
    await expect.poll(() => menuItem('US Customary Units').checked).toBe(true);
    click('Knots and Feet');
    await expect(byTest('units-kt-ft')).toHaveAttribute('aria-pressed', 'true');
    await byTest('units-us').click();
    await expect.poll(() => menuItem('US Customary Units').checked).toBe(true);
    expect(menuItem('Knots and Feet').checked).toBe(false);
    await byTest('units-kt-ft').click();
    await expect.poll(() => menuItem('Knots and Feet').checked).toBe(true);
    click('SI Units');
    await expect(byTest('units-si')).toHaveAttribute('aria-pressed', 'true');
  });

  test('exports through save dialogs filtered to each format, and prints the PDF report in a released print window', async () => {
    const svg = await exported('Export Diagram (SVG)…', 'diagram.svg');
    expect(svg.toString('utf8')).toMatch(/<svg[\s>]/);
    const png = await exported('Export Diagram (PNG)…', 'diagram.png');
    expect(png.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
    const csv = await exported('Export Boundaries (CSV)…', 'boundaries.csv');
    expect(csv.toString('utf8').split('\n').length).toBeGreaterThan(3);
    const json = JSON.parse((await exported('Export Concept (JSON)…', 'concept.json')).toString('utf8'));
    expect(json.format ?? json.schema ?? JSON.stringify(json)).toMatch(/loftpoint-concept\/1/);
    const html = (await exported('Export Design-Review Report (HTML)…', 'report.html')).toString('utf8');
    expect(html).toMatch(/^<!DOCTYPE html>/i);
    expect(html).toMatch(/[Pp]reliminary/);
    const pdf = await exported('Export Design-Review Report (PDF)…', 'report.pdf');
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const saveFilters = recorder.dialogs.filter((d) => d.kind === 'save').map((d) => d.options.filters?.[0]?.extensions[0]);
    expect(saveFilters).toEqual(expect.arrayContaining(['svg', 'png', 'csv', 'json', 'html', 'pdf']));
    const printWindows = recorder.windows.filter((window) => window.options.webPreferences?.javascript === false);
    expect(printWindows.length).toBe(1);
    for (const window of printWindows) {
      expect(window.destroyed).toBe(true);
      expect(window.webContents.session.cleared).toBe(1);
    }
  });

  test('New Project, then History lists none of the previous project’s versions; Open, Open Recent, Clear Recent', async () => {
    const second = join(documents, 'Second study.loftpoint');
    recorder.dialogAnswers.save.push(second);
    click('New Project…');
    await expect.poll(() => recorder.windows[0].title).toBe('Second study — Loftpoint');
    const newDialog = recorder.dialogs.at(-1)!;
    expect(newDialog.options.filters?.[0]?.extensions).toEqual(['loftpoint']);
    click('History');
    await expect(byTest('tab-history')).toHaveAttribute('aria-selected', 'true');
    await expect(byTest('version-list').locator('li')).toHaveCount(0);
    expect(pageErrors.filter((text) => /does not exist/.test(text))).toEqual([]);

    recorder.dialogAnswers.open.push(startFile);
    click('Open Project…');
    await expect.poll(() => recorder.windows[0].title).toBe('Start study — Loftpoint');
    expect(recorder.dialogs.at(-1)!.options.filters?.[0]?.extensions).toEqual(['loftpoint']);
    await expect(byTest('version-list').locator('li').first()).toBeVisible();

    click(basename(second));
    await expect.poll(() => recorder.windows[0].title).toBe('Second study — Loftpoint');
    expect(recorder.recentDocuments).toContain(second);
    click('Clear Recent');
    expect(menuItem('No recent projects').enabled).toBe(false);
  });

  test('a second launch hands over its project file, and a file of another kind gets a clear message', async () => {
    const emit = (argv: string[]) => {
      for (const listener of recorder.appListeners.get('second-instance') ?? []) listener({}, argv, folder);
    };
    emit(['/opt/electron/electron', '/opt/lp/out/main/index.js', '--project', startFile]);
    await expect.poll(() => recorder.windows[0].title).toBe('Start study — Loftpoint');
    emit(['/opt/electron/electron', '/opt/lp/out/main/index.js', 'notes.txt']);
    await expect.poll(() => recorder.messageBoxes.at(-1)?.detail).toMatch(/notes\.txt: not a Loftpoint project \(project files end in \.loftpoint\)/);
  });

  test('every remaining menu command reaches its target', async () => {
    click('Reset Diagram View');
    // The second launch above put its project back on Open Recent.
    click(basename(startFile));
    await expect.poll(() => recorder.windows[0].title).toBe('Start study — Loftpoint');
    click('About Loftpoint');
    expect(recorder.messageBoxes.at(-1)!.detail).toMatch(/[Pp]reliminary/);
    // Every item with an action of ours was exercised; the rest are Electron's own roles.
    const ours = items(recorder.applicationMenu!.template).filter((item) => item.click && item.label !== 'No recent projects');
    const missed = ours.map((item) => item.label!).filter((label) => !clicked.has(label));
    expect(missed).toEqual([]);
    expect(pageErrors).toEqual([]);
  });

  test('closing the window keeps its place for the next start', async () => {
    const designer = recorder.windows[0] as StandInWindow & { emit(event: string): void };
    designer.emit('close');
    const kept = JSON.parse(readFileSync(join(folder, 'data', 'window-state.json'), 'utf8'));
    expect(kept).toEqual({ bounds: { x: 0, y: 0, width: 1440, height: 900 }, maximized: false });
  });
});
