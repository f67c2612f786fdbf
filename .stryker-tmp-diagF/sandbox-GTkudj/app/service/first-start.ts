/**
 * Which project a front end opens: the one named, or on first start a
 * project in the user's data folder holding the demo concepts, so a newcomer
 * sees a full diagram at once. Shared by browser mode and the desktop window.
 */
// @ts-nocheck

import { existsSync, mkdirSync } from 'node:fs';
import { homedir } from 'node:os';
import { basename, extname, join, resolve } from 'node:path';
import type { ProjectInfo, ServiceResult } from '../shared/contract';
import type { ServiceHandlers } from './service';
import { invokeService } from './invoke';

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

/**
 * Opens `file`, or creates it with the demo concepts when it does not exist.
 * With no file, the first-start project in the data folder.
 */
export async function openOrCreateProject(
  service: ServiceHandlers,
  file: string | undefined,
  dataFolder: string,
): Promise<ServiceResult<OpenedProject>> {
  const target = file ? resolve(file) : firstProjectFile(dataFolder);
  if (existsSync(target)) {
    const opened = await invokeService(service, 'openProject', { file: target });
    return opened.ok ? { ok: true, value: { info: opened.value, created: false } } : opened;
  }
  if (!file) mkdirSync(dataFolder, { recursive: true });
  const name = file ? basename(target, extname(target)) || FIRST_PROJECT_NAME : FIRST_PROJECT_NAME;
  const created = await invokeService(service, 'createProject', { file: target, name, demo: true });
  return created.ok ? { ok: true, value: { info: created.value, created: true } } : created;
}
