/**
 * Starting browser mode: open (or on first start create) the project, make
 * sure the page is built, and serve both on 127.0.0.1 with a fresh token.
 */
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createService, invokeService, type ProjectService } from '../service';
import type { ProjectInfo, ServiceError } from '../service/contract';
import { createDispatch } from '../shared/dispatch';
import { fileDraftStore } from './drafts';
import { pagePolicy } from '../shared/page-policy';
import { openOrCreateProject, userDataFolder } from './first-start';
import { chromiumPrinter } from './print';
import { startBrowserServer, type BrowserServer } from './server';
import { rendererFolders } from './static-files';
import { createLaunchToken } from './token';

const PROJECT_ROOT = fileURLToPath(new URL('../..', import.meta.url));

export interface LaunchOptions {
  port: number;
  /** Project file to open or create; none: the first-start project in the data folder. */
  project?: string;
  /** Folder of the built page; default out/renderer (or dist/renderer). */
  rendererDir?: string;
  /** Where progress notes go (never stdout, whose first line is the address). */
  note?: (line: string) => void;
}

export interface BrowserMode {
  server: BrowserServer;
  project: ProjectInfo;
  created: boolean;
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

function builtPage(rendererDir: string | undefined): string | null {
  const folders = rendererDir ? [rendererDir] : rendererFolders(PROJECT_ROOT);
  return folders.find((folder) => existsSync(join(folder, 'index.html'))) ?? null;
}

/** Builds the page with Vite when it has not been built yet (a fresh clone). */
async function ensurePage(rendererDir: string | undefined, note: (line: string) => void): Promise<string> {
  const found = builtPage(rendererDir);
  if (found) return found;
  if (rendererDir) throw new LaunchError(`no built page in ${rendererDir} (index.html is missing)`, '--renderer');
  note('Building the window for the first time (a few seconds)...');
  try {
    const { build } = await import('vite');
    const { rendererConfig } = await import('../renderer/vite.config');
    await build({ ...rendererConfig, configFile: false, logLevel: 'error' });
  } catch (error) {
    const reason = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw new LaunchError(`the window could not be built (${reason}); run \`npm run build\` and try again`);
  }
  const built = builtPage(undefined);
  if (!built) throw new LaunchError('the window was built but out/renderer/index.html is missing');
  return built;
}

function projectProblem(error: ServiceError): LaunchError {
  return new LaunchError(error.message, '--project');
}

export async function launchBrowserMode(options: LaunchOptions): Promise<BrowserMode> {
  const note = options.note ?? (() => {});
  const service: ProjectService = createService();
  const opened = await openOrCreateProject(service, options.project, userDataFolder());
  if (!opened.ok) throw projectProblem(opened.error);
  let server: BrowserServer;
  try {
    const rendererDir = await ensurePage(options.rendererDir, note);
    const dispatch = createDispatch(
      (method, request) => invokeService(service, method, request),
      pagePolicy('start `loftpoint serve --project FILE` to work on another project'),
    );
    // Drafts are kept per project file in the data folder, so a restart on another port still offers them.
    const drafts = fileDraftStore(userDataFolder(), opened.value.info.file);
    server = await startBrowserServer({ port: options.port, token: createLaunchToken(), rendererDir, dispatch, printPdf: chromiumPrinter(), drafts });
  } catch (error) {
    await invokeService(service, 'closeProject', {});
    if (error instanceof LaunchError) throw error;
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'EADDRINUSE') throw new LaunchError(`port ${options.port} is in use; choose another with --port, or 0 for any free port`, '--port');
    if (code === 'EACCES') throw new LaunchError(`port ${options.port} may not be used by this user; choose one above 1023`, '--port');
    throw error;
  }
  return {
    server,
    project: opened.value.info,
    created: opened.value.created,
    close: async () => {
      await server.close();
      await invokeService(service, 'closeProject', {});
    },
  };
}
