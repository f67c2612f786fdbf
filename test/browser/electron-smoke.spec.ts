/**
 * The real desktop window, with Playwright's Electron support: launch,
 * diagram drawn, save a version, export the PDF report. It runs wherever an
 * Electron binary and better-sqlite3 built for Electron exist (after
 * `npm start` on a networked machine, or with ELECTRON_OVERRIDE_DIST_PATH and
 * LOFTPOINT_SQLITE_BINDING) and reports itself skipped, with the reason,
 * elsewhere. The desktop contract test covers the same ground without Electron.
 */
import { _electron as electron, expect, test } from '@playwright/test';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
// @ts-expect-error plain JavaScript module without types
import { electronBinary, nativeFolder, systemDeps } from '../../app/start-steps.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

/** The Electron executable and the SQLite binding, found without downloading or building anything. */
function desktopPieces(): { executable?: string; binding?: string; reason?: string } {
  const deps = systemDeps({ run: () => 1, log: () => {} });
  const override = process.env.ELECTRON_OVERRIDE_DIST_PATH;
  const installed = join(root, 'node_modules', 'electron', 'path.txt');
  if (!override && !existsSync(installed)) return { reason: 'no Electron binary on this machine (run `node node_modules/electron/install.js` where Electron’s release host is reachable, or set ELECTRON_OVERRIDE_DIST_PATH)' };
  const found = electronBinary(deps);
  if (!found.ok) return { reason: `no Electron binary: ${found.problem}` };
  const binding = process.env.LOFTPOINT_SQLITE_BINDING ?? join(nativeFolder(deps), 'better_sqlite3.node');
  if (!existsSync(binding)) return { reason: `no better-sqlite3 built for Electron at ${binding} (run \`npm start\` once on a networked machine, or set LOFTPOINT_SQLITE_BINDING)` };
  return { executable: found.path, binding };
}

const pieces = desktopPieces();

test('the real Electron window: launch, diagram drawn, save a version, export the PDF report', async () => {
  if (!pieces.executable) console.log(`Electron smoke test skipped: ${pieces.reason}`);
  test.skip(!pieces.executable, `Skipped: ${pieces.reason}`);
  test.setTimeout(180_000);
  const folder = mkdtempSync(join(tmpdir(), 'loftpoint-electron-'));
  const built = join(root, 'out', `electron-smoke-${process.pid}`);
  const build = spawnSync(join(root, 'node_modules/.bin/electron-vite'), ['build', '--config', 'electron.config.ts', '--outDir', built, '--logLevel', 'error'], {
    cwd: root,
    encoding: 'utf8',
    env: { ...process.env, VITE_CONFIG_NATIVE_IGNORE_WARNING: 'true' },
  });
  expect(build.status, build.stderr).toBe(0);
  const project = join(folder, 'Smoke study.loftpoint');
  const app = await electron.launch({
    executablePath: pieces.executable,
    args: [join(built, 'main', 'index.js'), `--project=${project}`],
    env: { ...process.env, LOFTPOINT_DATA_DIR: join(folder, 'data'), LOFTPOINT_SQLITE_BINDING: pieces.binding!, LOFTPOINT_AUTHOR: 'electron-smoke' },
  });
  try {
    const window = await app.firstWindow();
    await expect(window.getByTestId('window')).toHaveAttribute('data-ready', 'true', { timeout: 30_000 });
    await expect(window.getByTestId('design-point-marker')).toBeVisible();
    expect(window.url()).toBe('loftpoint://app/index.html');

    await window.getByTestId('open-save').click();
    await window.getByTestId('version-note').fill('Saved in the real desktop window');
    await window.getByTestId('save-version').click();
    await expect(window.getByTestId('status-message')).toContainText('Saved version');

    const pdf = join(folder, 'review.pdf');
    await app.evaluate(({ dialog, Menu }, file) => {
      dialog.showSaveDialog = (async () => ({ canceled: false, filePath: file })) as typeof dialog.showSaveDialog;
      type Item = { label: string; click: () => void; submenu?: { items: Item[] } | null };
      const all = (items: Item[]): Item[] => items.flatMap((item) => [item, ...(item.submenu ? all(item.submenu.items) : [])]);
      all((Menu.getApplicationMenu()?.items ?? []) as unknown as Item[])
        .find((item) => item.label.startsWith('Export Design-Review Report (PDF)'))!
        .click();
    }, pdf);
    await expect.poll(() => existsSync(pdf), { timeout: 60_000 }).toBe(true);
    expect(readFileSync(pdf).subarray(0, 5).toString('latin1')).toBe('%PDF-');
  } finally {
    await app.close();
    rmSync(built, { recursive: true, force: true });
  }
});
