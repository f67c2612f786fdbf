/**
 * The desktop shell, kept thin: it opens the project, makes the window,
 * answers the page's IPC with the one service, and builds the menus. Every
 * piece lives in its own file; this file only reads as the boot list.
 */
import { app, BrowserWindow, dialog, ipcMain, Menu, protocol, screen, type IpcMainEvent, type MessageBoxOptions } from 'electron';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createService, invokeService } from '../service';
import { PRELIMINARY_CAUTION } from '../service/contract';
import { isWindowStateReport, type WindowCommand } from '../shared/desktop-api';
import { createDispatch } from '../shared/dispatch';
import { pagePolicy } from '../shared/page-policy';
import { COMMAND_CHANNEL, WINDOW_STATE_CHANNEL } from '../shared/transport';
import { PROJECT_EXTENSION, userDataFolder } from '../service/first-start';
import { projectArgument } from './arguments';
import { exportFile } from './exports';
import { ipcHandlers, registerIpc, senderCheck } from './ipc';
import { hiddenPrintWindow, printInTurn, printReportPdf } from './print';
import { menuTemplate } from './menu';
import { PAGE_SCHEME, PAGE_SCHEME_PRIVILEGES, pageResponse } from './page-protocol';
import { projectShell } from './projects';
import { isOwnPage } from './security';
import { windowTitle } from './title';
import { createDesignerWindow, pageUrl, type WindowFiles } from './window';
import { readPlacement, writePlacement } from './window-state';

// Before the app is ready: the page's own scheme, standard and secure.
protocol.registerSchemesAsPrivileged([PAGE_SCHEME_PRIVILEGES]);

const here = fileURLToPath(new URL('.', import.meta.url));
const files: WindowFiles = {
  page: join(here, '../renderer/index.html'),
  preload: join(here, '../preload/index.cjs'),
  devUrl: !app.isPackaged ? process.env.ELECTRON_RENDERER_URL : undefined,
};
const dataFolder = userDataFolder();
const placementFile = join(dataFolder, 'window-state.json');
const service = createService();
const windows = new Set<BrowserWindow>();
/** Leading command-line entries that are the program itself. */
const argvSkip = app.isPackaged ? 1 : 2;
let units: 'si' | 'us' | 'kt-ft' = 'si';
let projectFile: string | null = null;
let dirty = false;

function send(command: WindowCommand): void {
  // A window being torn down stays in the set until 'closed'; sending to it would throw.
  for (const window of windows) if (!window.isDestroyed()) window.webContents.send(COMMAND_CHANNEL, command);
}

function showError(title: string, message: string): void {
  void dialog.showMessageBox({ type: 'error', title, message: title, detail: message });
}

function updateTitle(): void {
  for (const window of windows) {
    window.setTitle(windowTitle(projectFile, dirty));
    if (process.platform === 'darwin') {
      window.setDocumentEdited(dirty);
      if (projectFile) window.setRepresentedFilename(projectFile);
    }
  }
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
  projectOpened: (file) => {
    projectFile = file;
    dirty = false;
    updateTitle();
    app.addRecentDocument(file);
  },
});

/** A project named on a command line (this launch's or a second one's), or the problem with it. */
function namedProject(argv: readonly string[], cwd: string): string | undefined {
  const named = projectArgument(argv, argvSkip, cwd, PROJECT_EXTENSION);
  if (named.problem) showError('The project could not be opened', named.problem);
  return named.file;
}

function focusWindow(): void {
  const window = [...windows][0];
  if (!window) return;
  if (window.isMinimized()) window.restore();
  window.focus();
}

function setupSingleInstance(): boolean {
  if (app.requestSingleInstanceLock()) {
    // A second launch (a double-clicked project, or `loftpoint FILE`) hands its file to this window.
    app.on('second-instance', (_event, argv, workingDirectory) => {
      focusWindow();
      const file = namedProject(argv, workingDirectory);
      if (file) void shell.openFile(file);
    });
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
      printPdf: (_event, payload) => printInTurn(() => printReportPdf(payload, { openWindow: hiddenPrintWindow })),
    }),
  );
  // The page's units (the View menu's radio) and unsaved state (the title's mark).
  ipcMain.on(WINDOW_STATE_CHANNEL, (event: IpcMainEvent, state: unknown) => {
    if (!trusted(event) || !isWindowStateReport(state)) return;
    if (state.dirty !== dirty) {
      dirty = state.dirty;
      updateTitle();
    }
    if (state.units !== units) {
      units = state.units;
      setupMenu();
    }
  });
}

function setupMenu(): void {
  const template = menuTemplate(
    {
      newProject: () => void shell.newWithDialog(),
      openProject: () => void shell.openWithDialog(),
      openRecent: (file) => void shell.openFile(file),
      clearRecent: () => {
        shell.clearRecent();
        app.clearRecentDocuments();
      },
      send: (command) => {
        if (command === 'units-si' || command === 'units-us' || command === 'units-kt-ft') {
          units = command === 'units-si' ? 'si' : command === 'units-us' ? 'us' : 'kt-ft';
        }
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
  const placement = readPlacement(
    placementFile,
    screen.getAllDisplays().map((display) => display.workArea),
  );
  const window = createDesignerWindow(files, placement);
  windows.add(window);
  updateTitle();
  // The page sets its own <title>; the shell's title (project, unsaved mark) wins.
  window.on('page-title-updated', (event) => event.preventDefault());
  window.on('close', () => writePlacement(placementFile, { bounds: window.getNormalBounds(), maximized: window.isMaximized() }));
  window.on('closed', () => windows.delete(window));
}

async function start(): Promise<void> {
  if (!setupSingleInstance()) return;
  app.setName('Loftpoint');
  app.enableSandbox();
  // macOS hands over double-clicked project files this way, before or after ready.
  let pendingOpen: string | null = null;
  let ready = false;
  app.on('open-file', (event, file) => {
    event.preventDefault();
    if (ready) void shell.openFile(file);
    else pendingOpen = file;
  });
  await app.whenReady();
  protocol.handle(PAGE_SCHEME, (request) => pageResponse(request.url, dirname(files.page)));
  await shell.openInitial(pendingOpen ?? namedProject(process.argv, process.cwd()));
  ready = true;
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
