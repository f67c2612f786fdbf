/**
 * Starting browser mode: open (or on first start create) the project, find
 * the page built ahead, and serve both on 127.0.0.1 with a fresh token.
 */
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { ProjectService } from '../service';
import type { ProjectInfo, ServiceError } from '../shared/contract';
import type { Dispatch } from '../shared/transport';
import { fileDraftStore } from './drafts';
import { newProjectName, projectTarget, userDataFolder } from '../service/project-target';
import type { PrintPdf } from './print';
import { startBrowserServer, type BrowserServer, type PageStep } from './server';
import { rendererFolders } from './static-files';
import { createLaunchToken } from './token';
import { makeProjectOnWorker, singleFileBuild, type SingleFileBuild } from './new-project-worker';
import { demoChecksFile } from '../service/demo-checks';

const PROJECT_ROOT = fileURLToPath(new URL('../..', import.meta.url));

export interface LaunchOptions {
  port: number;
  /** Project file to open or create; none: the first-start project in the data folder. */
  project?: string;
  /** Folder of the built page; default out/renderer (or dist/renderer). */
  rendererDir?: string;
  /**
   * Where a new project is made on a worker thread, from the moment the server listens: the
   * single-file command line this runs from (default), or null to make it on this thread once
   * the page is on its way.
   */
  workerBuild?: SingleFileBuild | null;
}

export interface BrowserMode {
  server: BrowserServer;
  project: ProjectInfo;
  created: boolean;
  /** True when the new project was made on a worker thread. */
  madeOnWorker: boolean;
  close(): Promise<void>;
}

export class LaunchError extends Error {
  constructor(
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'LaunchError';
  }
}

/** The command that builds the page ahead (`npm install` and `npm start` run it too). */
export const BUILD_PAGE_COMMAND = 'npm run build:renderer';

/** The built page's folder, `rendererDir` or else the first of `folders` holding one; the server never builds it (no build tool at run time). */
export function findPage(rendererDir: string | undefined, folders: readonly string[] = rendererFolders(PROJECT_ROOT)): string {
  const found = (rendererDir ? [rendererDir] : folders).find((folder) => existsSync(join(folder, 'index.html')));
  if (found) return found;
  if (rendererDir) throw new LaunchError(`no built page in ${rendererDir} (index.html is missing)`, '--renderer');
  throw new LaunchError(`the window's page is not built yet (out/renderer/index.html is missing); run \`${BUILD_PAGE_COMMAND}\` in ${PROJECT_ROOT} and try again`);
}

function projectProblem(error: ServiceError): LaunchError {
  return new LaunchError(error.message, '--project');
}

/** At the latest this long after the address is printed, the project is opened whether or not a browser came... */
export const OPEN_PROJECT_AFTER_MS = 2000;
/** ...or this long after the page was sent, when none of its files has been asked for by then... */
export const OPEN_PROJECT_AFTER_PAGE_MS = 1500;
/** ...or once the browser has asked for no further file of the page for this long (it has them all and reads them). */
export const OPEN_PROJECT_QUIET_MS = 40;

/**
 * Starts browser mode. The server listens first and `onListening` receives its
 * address before the project is opened or created, so the browser can load the
 * page meanwhile; every API call waits until the project is open (none ever
 * sees it half made). Resolves once the project is open; a project that cannot
 * be opened closes the server and rejects with a LaunchError naming --project.
 */
/** What serving the API takes: the service (and with it the engine), its dispatch, the printer, first start. */
async function loadServiceParts() {
  const [{ createService, invokeService }, { createDispatch }, { pagePolicy }, { chromiumPrinter }, { openOrCreateProject }] = await Promise.all([
    import('../service'),
    import('../shared/dispatch'),
    import('../shared/page-policy'),
    import('./print'),
    import('../service/first-start'),
  ]);
  const service: ProjectService = createService();
  const dispatch = createDispatch(
    (method, request) => invokeService(service, method, request),
    pagePolicy('start `loftpoint serve --project FILE` to work on another project'),
  );
  return { service, invokeService, dispatch, printPdf: chromiumPrinter(), openOrCreateProject };
}

export async function launchBrowserMode(options: LaunchOptions, onListening: (url: string) => void = () => {}): Promise<BrowserMode> {
  const rendererDir = findPage(options.rendererDir);
  const dataFolder = userDataFolder();
  const target = projectTarget(options.project, dataFolder);
  let settle!: (problem: ServiceError | null) => void;
  const ready = new Promise<ServiceError | null>((resolveReady) => (settle = resolveReady));
  // Drafts are kept per project file in the data folder, so a restart on another port still offers them.
  const drafts = fileDraftStore(dataFolder, target);
  // The service and the engine load once the server listens: the address comes first, and API calls wait
  // for the project anyway (`ready`), which needs them.
  let parts: ReturnType<typeof loadServiceParts> | undefined;
  const serviceParts = () => (parts ??= loadServiceParts());
  const dispatch: Dispatch = async (method, request) => (await serviceParts()).dispatch(method, request);
  const printPdf: PrintPdf = async (html) => (await serviceParts()).printPdf(html);
  // A new project is made once the browser has the page's files to read, or asks the API, or no browser came
  // within a moment: making it evaluates the demo concepts, and serving the page should not wait behind that.
  let begun = false;
  let moment: ReturnType<typeof setTimeout> | undefined;
  let resolveBegin!: () => void;
  const pageLoading = new Promise<void>((resolvePage) => (resolveBegin = resolvePage));
  const begin = () => {
    begun = true;
    clearTimeout(moment);
    resolveBegin();
  };
  const onPageActivity = (step: PageStep) => {
    if (begun) return;
    if (step === 'api') return begin();
    clearTimeout(moment);
    moment = setTimeout(begin, step === 'page' ? OPEN_PROJECT_AFTER_PAGE_MS : OPEN_PROJECT_QUIET_MS);
  };
  let server: BrowserServer;
  try {
    server = await startBrowserServer({ port: options.port, token: createLaunchToken(), rendererDir, dispatch, printPdf, drafts, ready, onPageActivity });
  } catch (error) {
    settle({ code: 'io', message: 'browser mode did not start' });
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EADDRINUSE') throw new LaunchError(`port ${options.port} is in use; choose another with --port, or 0 for any free port`, '--port');
    if (code === 'EACCES') throw new LaunchError(`port ${options.port} may not be used by this user; choose one above 1023`, '--port');
    throw error;
  }
  onListening(server.url);
  if (!begun) moment ??= setTimeout(begin, OPEN_PROJECT_AFTER_MS);
  const workerBuild = options.workerBuild === undefined ? singleFileBuild() : options.workerBuild;
  const existed = existsSync(target);
  // Where the build recorded the demos' checks beside the single file, a new project is only a file to write:
  // this thread makes it at once, as soon as it has loaded the service, long before the browser asks.
  const quickToMake = !existed && workerBuild !== null && existsSync(demoChecksFile(workerBuild.bundle));
  // Otherwise a new project is begun on a worker thread at once; this thread then loads the service and the
  // engine while the browser comes for the page, so the project opens the moment the worker is done.
  let onWorker: Promise<boolean> | null = null;
  if (!existed && workerBuild && !quickToMake) {
    try {
      if (!options.project) mkdirSync(dataFolder, { recursive: true });
      onWorker = makeProjectOnWorker(workerBuild, target, newProjectName(options.project, target));
    } catch {
      onWorker = null; // the data folder could not be made: this thread makes the project, with its own error
    }
  }
  let madeOnWorker = false;
  let opened: Awaited<ReturnType<Awaited<ReturnType<typeof loadServiceParts>>['openOrCreateProject']>>;
  let loaded: Awaited<ReturnType<typeof loadServiceParts>> | undefined;
  try {
    loaded = await serviceParts();
    // An existing project opens at once (a file that is not one is reported without delay). A new one made on
    // the worker is opened once it is there whole; where there is no worker, or the worker did not make it, it
    // is made here once the page is on its way, with this thread's own error.
    opened = await loaded.openOrCreateProject(loaded.service, options.project, dataFolder, {
      existed,
      beforeCreating: () => (quickToMake ? Promise.resolve() : pageLoading),
      ...(onWorker ? { makeElsewhere: async () => (madeOnWorker = await onWorker) } : {}),
    });
  } catch (error) {
    opened = { ok: false, error: { code: 'internal', message: error instanceof Error ? error.message.split('\n')[0] : String(error) } };
  }
  begin();
  if (!opened.ok) {
    settle(opened.error);
    await server.close();
    if (loaded) await loaded.invokeService(loaded.service, 'closeProject', {});
    throw projectProblem(opened.error);
  }
  settle(null);
  const { service, invokeService } = loaded!;
  return {
    server,
    project: opened.value.info,
    created: opened.value.created,
    madeOnWorker,
    close: async () => {
      await server.close();
      await invokeService(service, 'closeProject', {});
    },
  };
}
