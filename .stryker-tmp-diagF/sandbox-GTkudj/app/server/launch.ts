/**
 * Starting browser mode: open (or on first start create) the project, find
 * the page built ahead, and serve both on 127.0.0.1 with a fresh token.
 */
// @ts-nocheck

import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createService, invokeService, type ProjectService } from '../service';
import type { ProjectInfo, ServiceError } from '../shared/contract';
import { createDispatch } from '../shared/dispatch';
import { fileDraftStore } from './drafts';
import { pagePolicy } from '../shared/page-policy';
import { openOrCreateProject, userDataFolder } from '../service/first-start';
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

export async function launchBrowserMode(options: LaunchOptions): Promise<BrowserMode> {
  const service: ProjectService = createService();
  const opened = await openOrCreateProject(service, options.project, userDataFolder());
  if (!opened.ok) throw projectProblem(opened.error);
  let server: BrowserServer;
  try {
    const rendererDir = findPage(options.rendererDir);
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
