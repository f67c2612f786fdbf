/**
 * Opening and creating project files from the shell: the dialogs choose the
 * file, the service opens it, the recent list remembers it and the page is
 * told to reload. Plain functions over injected pieces, so tests need no
 * Electron.
 */
// @ts-nocheck

import { basename, extname } from 'node:path';
import { invokeService, type ServiceHandlers } from '../service';
import type { ProjectInfo } from '../service/contract';
import type { WindowCommand } from '../shared/desktop-api';
import { openOrCreateProject } from '../service/first-start';
import { readRecent, withRecent, writeRecent } from './recent';

export interface ProjectShellDeps {
  service: ServiceHandlers;
  dataFolder: string;
  recentFile: string;
  askOpenPath(): Promise<string | null>;
  askNewPath(): Promise<string | null>;
  notify(command: WindowCommand): void;
  showError(title: string, message: string): void;
  /** Called with the new list whenever it changes (the menu is rebuilt). */
  recentChanged(list: readonly string[]): void;
  /** Called with the file of each project opened or created (the window title follows). */
  projectOpened?(file: string): void;
}

export interface ProjectShell {
  /** First start: the named project, or the demo project in the data folder. */
  openInitial(file: string | undefined): Promise<ProjectInfo | null>;
  openFile(file: string): Promise<boolean>;
  openWithDialog(): Promise<boolean>;
  newWithDialog(): Promise<boolean>;
  clearRecent(): void;
  recent(): string[];
}

export function projectShell(deps: ProjectShellDeps): ProjectShell {
  const remember = (file: string) => {
    const list = withRecent(readRecent(deps.recentFile), file);
    writeRecent(deps.recentFile, list);
    deps.recentChanged(list);
    deps.projectOpened?.(file);
  };

  const opened = (info: ProjectInfo) => {
    remember(info.file);
    deps.notify('project-changed');
    return true;
  };

  return {
    async openInitial(file) {
      const result = await openOrCreateProject(deps.service, file, deps.dataFolder);
      if (!result.ok) {
        deps.showError('The project could not be opened', result.error.message);
        return null;
      }
      remember(result.value.info.file);
      return result.value.info;
    },
    async openFile(file) {
      const result = await invokeService(deps.service, 'openProject', { file });
      if (!result.ok) {
        deps.showError('The project could not be opened', result.error.message);
        return false;
      }
      return opened(result.value);
    },
    async openWithDialog() {
      const file = await deps.askOpenPath();
      return file === null ? false : this.openFile(file);
    },
    async newWithDialog() {
      const file = await deps.askNewPath();
      if (file === null) return false;
      const name = basename(file, extname(file)) || 'New project';
      const result = await invokeService(deps.service, 'createProject', { file, name });
      if (!result.ok) {
        deps.showError('The project could not be created', result.error.message);
        return false;
      }
      return opened(result.value);
    },
    clearRecent() {
      writeRecent(deps.recentFile, []);
      deps.recentChanged([]);
    },
    recent() {
      return readRecent(deps.recentFile);
    },
  };
}
