/**
 * Which project a front end opens: the one named, or on first start a
 * project in the user's data folder holding the demo concepts, so a newcomer
 * sees a full diagram at once. Shared by browser mode and the desktop window.
 */
import { existsSync, mkdirSync } from 'node:fs';
import type { ProjectInfo, ServiceResult } from '../shared/contract';
import type { ServiceHandlers } from './service';
import { invokeService } from './invoke';
import { checkedDemo, demoConcepts } from './engine';
import { newProjectName, projectTarget } from './project-target';

export { PROJECT_EXTENSION, firstProjectFile, newProjectName, projectTarget, userDataFolder } from './project-target';

export interface OpenedProject {
  info: ProjectInfo;
  /** True when the file was made just now (with the demo concepts). */
  created: boolean;
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
  /**
   * Whether the file was there when the front end started: given when a new project's making
   * began before this call (browser mode's worker), so a project made meanwhile still counts as new.
   */
  existed?: boolean;
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
  if (options.existed ?? existsSync(target)) {
    const opened = await invokeService(service, 'openProject', { file: target });
    return opened.ok ? { ok: true, value: { info: opened.value, created: false } } : opened;
  }
  if (!file) mkdirSync(dataFolder, { recursive: true });
  const name = newProjectName(file, target);
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
