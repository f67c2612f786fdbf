/**
 * Which project a front end opens: the one named, or on first start a
 * project in the user's data folder holding the demo concepts, so a newcomer
 * sees a full diagram at once. Shared by browser mode and the desktop window.
 */
import { existsSync, mkdirSync } from 'node:fs';
import { homedir } from 'node:os';
import { basename, extname, join, resolve } from 'node:path';
import type { ProjectInfo, ServiceResult } from '../shared/contract';
import type { ServiceHandlers } from './service';
import { invokeService } from './invoke';
import { checkedDemo, demoConcepts } from './engine';

export const PROJECT_EXTENSION = '.loftpoint';
const FIRST_PROJECT_NAME = 'Demo project';

/** The user's data folder: $LOFTPOINT_DATA_DIR, else the platform's usual place for application data. */
export function userDataFolder(env: NodeJS.ProcessEnv = process.env, platform: NodeJS.Platform = process.platform, home = homedir()): string {
  if (env.LOFTPOINT_DATA_DIR) return resolve(env.LOFTPOINT_DATA_DIR);
  if (platform === 'win32') return join(env.APPDATA ?? join(home, 'AppData', 'Roaming'), 'Loftpoint');
  if (platform === 'darwin') return join(home, 'Library', 'Application Support', 'Loftpoint');
  return join(env.XDG_CONFIG_HOME ?? join(home, '.config'), 'Loftpoint');
}

export function firstProjectFile(dataFolder: string): string {
  return join(dataFolder, `${FIRST_PROJECT_NAME}${PROJECT_EXTENSION}`);
}

export interface OpenedProject {
  info: ProjectInfo;
  /** True when the file was made just now (with the demo concepts). */
  created: boolean;
}

/** The project file a front end opens: `file` resolved, or the first-start project in the data folder. */
export function projectTarget(file: string | undefined, dataFolder: string): string {
  return file ? resolve(file) : firstProjectFile(dataFolder);
}

/**
 * Evaluates the demo concepts one at a time, letting other work run between
 * them (a server answering the page while a new project is made), so that
 * creating the project then finds them evaluated. A demo that fails here is
 * reported by the creation itself.
 */
async function evaluateDemosAhead(): Promise<void> {
  for (const demo of demoConcepts()) {
    await new Promise((resolveTurn) => setImmediate(resolveTurn));
    try {
      checkedDemo(demo);
    } catch {
      return;
    }
  }
  await new Promise((resolveTurn) => setImmediate(resolveTurn));
}

export interface OpenOrCreateOptions {
  /** Waited for before a new project is made here (browser mode: until the page is on its way). */
  beforeCreating?: () => Promise<unknown>;
  /**
   * Makes the new project elsewhere (browser mode: on a worker thread), resolving true once the
   * file is there whole; it is then opened. On false the project is made here, as without it.
   */
  makeElsewhere?: (file: string, name: string) => Promise<boolean>;
}

/**
 * Opens `file`, or creates it with the demo concepts when it does not exist
 * (after `beforeCreating`, when given). With no file, the first-start project
 * in the data folder.
 */
export async function openOrCreateProject(
  service: ServiceHandlers,
  file: string | undefined,
  dataFolder: string,
  options: OpenOrCreateOptions = {},
): Promise<ServiceResult<OpenedProject>> {
  const target = projectTarget(file, dataFolder);
  if (existsSync(target)) {
    const opened = await invokeService(service, 'openProject', { file: target });
    return opened.ok ? { ok: true, value: { info: opened.value, created: false } } : opened;
  }
  if (!file) mkdirSync(dataFolder, { recursive: true });
  const name = file ? basename(target, extname(target)) || FIRST_PROJECT_NAME : FIRST_PROJECT_NAME;
  if (options.makeElsewhere && (await options.makeElsewhere(target, name))) {
    const opened = await invokeService(service, 'openProject', { file: target });
    return opened.ok ? { ok: true, value: { info: opened.value, created: true } } : opened;
  }
  // A new project waits for its moment (browser mode: once the page is on its way), then evaluates the demos.
  await options.beforeCreating?.();
  await evaluateDemosAhead();
  const created = await invokeService(service, 'createProject', { file: target, name, demo: true });
  return created.ok ? { ok: true, value: { info: created.value, created: true } } : created;
}
