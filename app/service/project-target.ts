/**
 * Where a front end's project lives: the file named, or on first start the
 * demo project in the user's data folder. Node's own modules only, so a front
 * end can decide this before it loads the service and the engine.
 */
import { homedir } from 'node:os';
import { basename, extname, join, resolve } from 'node:path';

export const PROJECT_EXTENSION = '.loftpoint';
export const FIRST_PROJECT_NAME = 'Demo project';

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

/** The project file a front end opens: `file` resolved, or the first-start project in the data folder. */
export function projectTarget(file: string | undefined, dataFolder: string): string {
  return file ? resolve(file) : firstProjectFile(dataFolder);
}

/** The name a new project at `target` gets: its file's name, or the first-start project's. */
export function newProjectName(file: string | undefined, target: string): string {
  return file ? basename(target, extname(target)) || FIRST_PROJECT_NAME : FIRST_PROJECT_NAME;
}
