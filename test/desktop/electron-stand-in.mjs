// NOT ELECTRON. A stand-in for the `electron` module, for the desktop
// contract test on machines without an Electron binary: it records every call
// the built main process makes (windows, IPC handlers, menus, dialogs, the
// page protocol, app events) and hands the work that needs a browser (showing
// a page, printing to PDF) to whatever driver the test installs. Its state
// lives on globalThis so the test and the built main share one recorder.
const KEY = '__loftpointElectronStandIn';

function createRecorder() {
  return {
    calls: [],
    appListeners: new Map(),
    ipcHandlers: new Map(),
    ipcListeners: new Map(),
    windows: [],
    menus: [],
    applicationMenu: null,
    privilegedSchemes: [],
    protocolHandlers: new Map(),
    dialogAnswers: { open: [], save: [] },
    dialogs: [],
    messageBoxes: [],
    recentDocuments: [],
    /** Set by the test: shows a window's page (designer or print window). */
    driver: null,
    record(name, ...args) {
      this.calls.push({ name, args });
    },
  };
}

const recorder = (globalThis[KEY] ??= createRecorder());
export { recorder };

let nextId = 1;

class WebContents {
  constructor(window) {
    this.window = window;
    this.id = nextId++;
    this.listeners = new Map();
    this.session = {
      cleared: 0,
      setPermissionRequestHandler: (handler) => void (this.session.permissionRequest = handler),
      setPermissionCheckHandler: (handler) => void (this.session.permissionCheck = handler),
      webRequest: { onBeforeRequest: (handler) => void (this.session.beforeRequest = handler) },
      clearStorageData: async () => void (this.session.cleared += 1),
      clearCache: async () => undefined,
    };
  }
  on(event, listener) {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }
  setWindowOpenHandler(handler) {
    this.windowOpenHandler = handler;
  }
  send(channel, ...args) {
    recorder.record('webContents.send', channel, ...args);
    return recorder.driver?.send(this.window, channel, args);
  }
  async printToPDF(options) {
    recorder.record('webContents.printToPDF', options);
    return recorder.driver.printToPDF(this.window, options);
  }
}

export class BrowserWindow {
  static fromWebContents(contents) {
    return recorder.windows.find((window) => window.webContents === contents) ?? null;
  }
  constructor(options = {}) {
    this.options = options;
    this.webContents = new WebContents(this);
    this.listeners = new Map();
    this.title = options.title ?? '';
    this.destroyed = false;
    this.shown = false;
    this.bounds = { x: options.x ?? 0, y: options.y ?? 0, width: options.width ?? 800, height: options.height ?? 600 };
    recorder.windows.push(this);
    recorder.record('new BrowserWindow', options);
  }
  on(event, listener) {
    this.listeners.set(event, [...(this.listeners.get(event) ?? []), listener]);
    return this;
  }
  once(event, listener) {
    return this.on(event, listener);
  }
  emit(event, ...args) {
    for (const listener of this.listeners.get(event) ?? []) listener(...args);
  }
  async loadURL(url) {
    this.url = url;
    recorder.record('loadURL', url);
    await recorder.driver.show(this, url);
    this.emit('ready-to-show');
  }
  async loadFile(file) {
    this.file = file;
    recorder.record('loadFile', file);
    await recorder.driver.showFile(this, file);
  }
  show() {
    this.shown = true;
  }
  setTitle(title) {
    this.title = title;
  }
  getTitle() {
    return this.title;
  }
  setDocumentEdited() {}
  setRepresentedFilename() {}
  isMinimized() {
    return false;
  }
  restore() {}
  focus() {
    recorder.record('focus');
  }
  maximize() {}
  isMaximized() {
    return false;
  }
  getNormalBounds() {
    return this.bounds;
  }
  isDestroyed() {
    return this.destroyed;
  }
  destroy() {
    this.destroyed = true;
    recorder.record('destroy window');
    void recorder.driver?.close(this);
  }
}

export const app = {
  isPackaged: false,
  getVersion: () => '0.0.0-stand-in',
  getPath: (name) => process.env[`LOFTPOINT_STAND_IN_${name.toUpperCase()}`] ?? process.cwd(),
  setName: (name) => recorder.record('app.setName', name),
  enableSandbox: () => recorder.record('app.enableSandbox'),
  requestSingleInstanceLock: () => true,
  whenReady: async () => recorder.record('app.whenReady'),
  on(event, listener) {
    recorder.appListeners.set(event, [...(recorder.appListeners.get(event) ?? []), listener]);
    return app;
  },
  emit(event, ...args) {
    for (const listener of recorder.appListeners.get(event) ?? []) listener(...args);
  },
  quit: () => recorder.record('app.quit'),
  addRecentDocument: (file) => void recorder.recentDocuments.push(file),
  clearRecentDocuments: () => void (recorder.recentDocuments.length = 0),
};

export const ipcMain = {
  handle: (channel, handler) => void recorder.ipcHandlers.set(channel, handler),
  removeHandler: (channel) => void recorder.ipcHandlers.delete(channel),
  on: (channel, listener) => void recorder.ipcListeners.set(channel, [...(recorder.ipcListeners.get(channel) ?? []), listener]),
};

export const Menu = {
  buildFromTemplate: (template) => ({ template }),
  setApplicationMenu: (menu) => {
    recorder.menus.push(menu);
    recorder.applicationMenu = menu;
  },
};

export const dialog = {
  async showOpenDialog(...args) {
    const options = args.at(-1);
    recorder.dialogs.push({ kind: 'open', options });
    const file = recorder.dialogAnswers.open.shift();
    return file ? { canceled: false, filePaths: [file] } : { canceled: true, filePaths: [] };
  },
  async showSaveDialog(...args) {
    const options = args.at(-1);
    recorder.dialogs.push({ kind: 'save', options });
    const file = recorder.dialogAnswers.save.shift();
    return file ? { canceled: false, filePath: file } : { canceled: true, filePath: '' };
  },
  async showMessageBox(...args) {
    recorder.messageBoxes.push(args.at(-1));
    return { response: 0 };
  },
};

export const protocol = {
  registerSchemesAsPrivileged: (schemes) => void recorder.privilegedSchemes.push(...schemes),
  handle: (scheme, handler) => void recorder.protocolHandlers.set(scheme, handler),
};

export const screen = {
  getAllDisplays: () => [{ workArea: { x: 0, y: 0, width: 1920, height: 1080 } }],
};

export default { app, BrowserWindow, ipcMain, Menu, dialog, protocol, screen };
