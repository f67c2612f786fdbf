/**
 * The desktop shell, kept thin: it opens the project, makes the window,
 * answers the page's IPC with the one service, and builds the menus. Every
 * piece lives in its own file; this file only reads as the boot list.
 */
import { app, BrowserWindow, dialog, ipcMain, Menu, type MessageBoxOptions } from 'electron';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createService, invokeService } from '../service';
import { PRELIMINARY_CAUTION } from '../service/contract';
import type { WindowCommand } from '../shared/desktop-api';
import { createDispatch } from '../shared/dispatch';
import { pagePolicy } from '../shared/page-policy';
import { COMMAND_CHANNEL } from '../shared/transport';
import { PROJECT_EXTENSION, userDataFolder } from '../service/first-start';
import { exportFile } from './exports';
import { ipcHandlers, registerIpc, senderCheck } from './ipc';
import { hiddenPrintWindow, printReportPdf } from './print';
import { menuTemplate } from './menu';
import { projectShell } from './projects';
import { isOwnPage } from './security';
import { createDesignerWindow, pageUrl, type WindowFiles } from './window';

const here = fileURLToPath(new URL('.', import.meta.url));
const files: WindowFiles = {
  page: join(here, '../renderer/index.html'),
  preload: join(here, '../preload/index.cjs'),
  devUrl: !app.isPackaged ? process.env.ELECTRON_RENDERER_URL : undefined,
};
const dataFolder = userDataFolder();
const service = createService();
const windows = new Set<BrowserWindow>();
let units: 'si' | 'us' = 'si';

function send(command: WindowCommand): void {
  for (const window of windows) window.webContents.send(COMMAND_CHANNEL, command);
}

function showError(title: string, message: string): void {
  void dialog.showMessageBox({ type: 'error', title, message: title, detail: message });
}

const filters = [{ name: 'Loftpoint project', extensions: [PROJECT_EXTENSION.slice(1)] }];
const shell = projectShell({
  service,
  dataFolder,
  recentFile: join(dataFolder, 'recent-projects.json'),
  askOpenPath: async () => {
    const result = await dialog.showOpenDialog({ title: 'Open project', properties: ['openFile'], filters });
    return result.canceled ? null : (result.filePaths[0] ?? null);
  },
  askNewPath: async () => {
    const result = await dialog.showSaveDialog({ title: 'New project', defaultPath: join(app.getPath('documents'), `New project${PROJECT_EXTENSION}`), filters });
    return result.canceled || !result.filePath ? null : result.filePath;
  },
  notify: send,
  showError,
  recentChanged: () => setupMenu(),
});

function setupSingleInstance(): boolean {
  if (app.requestSingleInstanceLock()) {
    app.on('second-instance', () => [...windows][0]?.focus());
    return true;
  }
  app.quit();
  return false;
}

function setupIpc(): void {
  const dispatch = createDispatch((method, request) => invokeService(service, method, request), pagePolicy('use File > Open Project or File > New Project'));
  const trusted = senderCheck(
    (sender) => [...windows].some((window) => window.webContents === sender),
    (url) => isOwnPage(url, pageUrl(files)),
  );
  registerIpc(
    ipcMain,
    ipcHandlers({
      dispatch,
      isTrustedSender: trusted,
      exportFile: (event, payload) =>
        exportFile(
          payload,
          async (options) => {
            const owner = BrowserWindow.fromWebContents(event.sender as Electron.WebContents);
            const result = owner ? await dialog.showSaveDialog(owner, options) : await dialog.showSaveDialog(options);
            return result.canceled || !result.filePath ? null : result.filePath;
          },
          app.getPath('documents'),
        ),
      printPdf: (_event, payload) => printReportPdf(payload, { openWindow: hiddenPrintWindow }),
    }),
  );
}

function setupMenu(): void {
  const template = menuTemplate(
    {
      newProject: () => void shell.newWithDialog(),
      openProject: () => void shell.openWithDialog(),
      openRecent: (file) => void shell.openFile(file),
      clearRecent: () => shell.clearRecent(),
      send: (command) => {
        if (command === 'units-si' || command === 'units-us') units = command === 'units-si' ? 'si' : 'us';
        send(command);
      },
      about: () => {
        const options: MessageBoxOptions = { type: 'info', title: 'About Loftpoint', message: `Loftpoint ${app.getVersion()}`, detail: PRELIMINARY_CAUTION };
        void dialog.showMessageBox(options);
      },
    },
    { platform: process.platform, recent: shell.recent(), units, developer: !app.isPackaged },
  );
  Menu.setApplicationMenu(Menu.buildFromTemplate(template));
}

function setupWindow(): void {
  const window = createDesignerWindow(files);
  windows.add(window);
  window.on('closed', () => windows.delete(window));
}

async function start(): Promise<void> {
  if (!setupSingleInstance()) return;
  app.setName('Loftpoint');
  app.enableSandbox();
  await app.whenReady();
  const projectArgument = process.argv.slice(app.isPackaged ? 1 : 2).find((arg) => arg.endsWith(PROJECT_EXTENSION));
  await shell.openInitial(projectArgument);
  setupIpc();
  setupMenu();
  setupWindow();
  app.on('activate', () => {
    if (windows.size === 0) setupWindow();
  });
  app.on('window-all-closed', () => {
    if (process.platform !== 'darwin') app.quit();
  });
  app.on('before-quit', () => void invokeService(service, 'closeProject', {}));
}

void start();
